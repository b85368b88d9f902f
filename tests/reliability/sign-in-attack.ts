// A password-guessing attack on POST /auth/sign-in, run while the readers load the server: wrong
// passwords from one address against ever-new accounts (only the per-address limit can stop it)
// and against one account from ever-new addresses (only the per-account limit can). Each must
// answer 401 up to its limit and 429 after; a bystander on an untouched address and account must
// still sign in, so the limits are keyed as claimed rather than shut for everyone.
import { randomInt } from 'node:crypto';
import { attemptSignIn, newSession } from './sessions';

/** Failed attempts allowed per 15 minutes (server/auth/rate-limits.ts). */
const PER_ADDRESS_LIMIT = 20;
const PER_ACCOUNT_LIMIT = 5;
/** Attempts past each limit, all of which must be refused. */
const PAST_LIMIT = 5;

export type SignInLimitResult = { perAddress: boolean; perAccount: boolean; detail: string };
export type AttackAccounts = { password: string; target: string; bystander: string };

/** Private addresses no other caller in this process uses, so every attack starts with clean counters. */
let addressCounter = randomInt(1 << 20);
const freshAddress = (): string => {
  const n = addressCounter++;
  return `10.${(n >> 16) & 255}.${(n >> 8) & 255}.${n & 255}`;
};

/** `count` attempts in turn; their statuses. */
async function attempts(count: number, attempt: (i: number) => Promise<number>): Promise<number[]> {
  const statuses: number[] = [];
  for (let i = 0; i < count; i++) statuses.push(await attempt(i));
  return statuses;
}

const limitedAfter = (statuses: number[], limit: number): boolean =>
  statuses.slice(0, limit).every((s) => s === 401) && statuses.slice(limit).every((s) => s === 429);

const tally = (statuses: number[]): string => {
  const counts = new Map<number, number>();
  for (const s of statuses) counts.set(s, (counts.get(s) ?? 0) + 1);
  return [...counts].map(([status, n]) => `${n} × ${status}`).join(', ');
};

export async function signInAttack(baseUrl: string, accounts: AttackAccounts): Promise<SignInLimitResult> {
  const session = await newSession(baseUrl);
  const wrong = (email: string, from: string): Promise<number> => attemptSignIn(baseUrl, session, email, 'wrong-guess', from).then((r) => r.status);
  const attacker = freshAddress();
  const [byAddress, byAccount] = await Promise.all([
    attempts(PER_ADDRESS_LIMIT + PAST_LIMIT, (i) => wrong(`guess.${i}.${attacker}@load.example`, attacker)),
    attempts(PER_ACCOUNT_LIMIT + PAST_LIMIT, () => wrong(accounts.target, freshAddress())),
  ]);
  const bystander = (await attemptSignIn(baseUrl, await newSession(baseUrl), accounts.bystander, accounts.password, freshAddress())).status;
  const bystanderSignedIn = bystander === 200;
  return {
    perAddress: limitedAfter(byAddress, PER_ADDRESS_LIMIT) && bystanderSignedIn,
    perAccount: limitedAfter(byAccount, PER_ACCOUNT_LIMIT) && bystanderSignedIn,
    detail:
      `from one address against ${byAddress.length} accounts: ${tally(byAddress)} (limit ${PER_ADDRESS_LIMIT}); ` +
      `against one account from ${byAccount.length} addresses: ${tally(byAccount)} (limit ${PER_ACCOUNT_LIMIT}); ` +
      `another account from another address: ${bystander}`,
  };
}
