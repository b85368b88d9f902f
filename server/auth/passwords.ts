// bcrypt on a worker thread. bcryptjs is plain JavaScript: a comparison at 10 rounds holds the
// thread it runs on for about 100 ms (its async API yields only every 100 ms), so on the event
// loop every sign-in attempt, a guesser's included, would stall every other request.
import type { Worker } from 'node:worker_threads';
import { startThread } from '../engine/start-thread';
import type { PasswordReply, PasswordRequest, PasswordTask } from './passwords-thread';

type Pending = { resolve: (value: string | boolean) => void; reject: (err: Error) => void };

const threadFile = require.resolve('./passwords-thread');
const pending = new Map<number, Pending>();
let nextId = 0;
let worker: Worker | null = null;

function startPasswordThread(): Worker {
  const started = startThread(threadFile);
  started.on('message', ({ id, value, error }: PasswordReply) => {
    const task = pending.get(id);
    pending.delete(id);
    if (error !== undefined || value === undefined) task?.reject(new Error(error ?? 'no answer from the password thread'));
    else task?.resolve(value);
    // An idle thread does not keep the process alive.
    if (pending.size === 0) started.unref();
  });
  // A thread that dies fails what it was given; the next task starts a new one.
  const fail = (err: Error): void => {
    if (worker === started) worker = null;
    for (const task of pending.values()) task.reject(err);
    pending.clear();
  };
  started.on('error', fail);
  started.on('exit', (code) => fail(new Error(`the password thread exited with ${code}`)));
  return started;
}

function run(request: PasswordRequest): Promise<string | boolean> {
  worker ??= startPasswordThread();
  worker.ref();
  const id = nextId++;
  return new Promise((resolve, reject) => {
    pending.set(id, { resolve, reject });
    worker!.postMessage({ ...request, id } satisfies PasswordTask);
  });
}

export const hashPassword = (password: string): Promise<string> => run({ op: 'hash', password }) as Promise<string>;

/** Whether `password` matches `hash`; with no hash (no such account) false, after the same work. */
export const passwordMatches = (password: string, hash: string | null): Promise<boolean> => run({ op: 'compare', password, hash }) as Promise<boolean>;
