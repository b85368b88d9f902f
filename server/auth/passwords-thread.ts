// Worker thread of passwords.ts: bcrypt hashes and comparisons, one at a time.
import bcrypt from 'bcryptjs';
import { parentPort } from 'node:worker_threads';

const BCRYPT_ROUNDS = 10;

export type PasswordRequest = { password: string } & ({ op: 'hash' } | { op: 'compare'; hash: string | null });
export type PasswordTask = PasswordRequest & { id: number };
export type PasswordReply = { id: number; value?: string | boolean; error?: string };

// Compared against when there is no account, so timing does not reveal which addresses have one.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', BCRYPT_ROUNDS);

function answer(task: PasswordTask): string | boolean {
  if (task.op === 'hash') return bcrypt.hashSync(task.password, BCRYPT_ROUNDS);
  const matches = bcrypt.compareSync(task.password, task.hash ?? DUMMY_HASH);
  return matches && task.hash !== null;
}

parentPort?.on('message', (task: PasswordTask) => {
  try {
    parentPort?.postMessage({ id: task.id, value: answer(task) } satisfies PasswordReply);
  } catch (err) {
    parentPort?.postMessage({ id: task.id, error: err instanceof Error ? err.message : String(err) } satisfies PasswordReply);
  }
});
