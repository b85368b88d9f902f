// Load on loopback: `connections` signed-in readers (one team member and session each) read the
// summaries and step maps of the demo's finished runs for `durationSeconds` through autocannon,
// while a sign-in attack checks that the per-address and per-account limits still answer 429.
import type autocannon from 'autocannon';
import { cannon, type CannonFigures, type CannonOptions } from './cannon';
import { LOAD_PASSWORD, startLoadServer, type FinishedRun, type LoadServer } from './load-server';
import { signInAttack, type SignInLimitResult } from './sign-in-attack';

export type LoadOptions = CannonOptions;
export type LoadResult = CannonFigures & { signInLimit: SignInLimitResult };

/** Steps each reader plays in a row per run, as the playback screen asks for them. */
const FRAMES_PER_RUN = 4;
/** Spreads the readers' starting steps over the run. */
const STEP_STRIDE = 7;

/** Reader `connection`'s loop: per run, its summary and FRAMES_PER_RUN consecutive maps from a step of its own. */
function readerRequests(runs: FinishedRun[], cookie: string, connection: number): autocannon.Request[] {
  // What a browser sends with every request (Chromium, Firefox and Safari all offer gzip).
  const headers = { cookie, 'accept-encoding': 'gzip, deflate, br' };
  return runs.flatMap((run) => {
    const first = (connection * STEP_STRIDE) % (run.steps + 1);
    return [
      { method: 'GET' as const, path: `/api/v1/runs/${run.id}/summary`, headers },
      ...Array.from({ length: FRAMES_PER_RUN }, (_, i) => ({ method: 'GET' as const, path: `/api/v1/runs/${run.id}/frames/${(first + i) % (run.steps + 1)}`, headers })),
    ];
  });
}

/** The baseline: the same connections and duration on the health route (one SELECT 1, no session). */
export function healthAgainst(server: LoadServer, options: LoadOptions): Promise<CannonFigures> {
  return cannon(server.url, options, () => [{ method: 'GET', path: '/api/v1/health' }]);
}

/** The readers alone against a server from startLoadServer. */
export function readersAgainst(server: LoadServer, options: LoadOptions): Promise<CannonFigures> {
  const { url, runs, readerCookies } = server;
  return cannon(url, options, (i) => readerRequests(runs, readerCookies[i % readerCookies.length], i));
}

/** The readers and the attack against a server from startLoadServer (with at least two spare accounts). */
export async function loadAgainst(server: LoadServer, options: LoadOptions): Promise<LoadResult> {
  const { url, spareEmails } = server;
  let readersDone = false;
  const readers = readersAgainst(server, options).finally(() => {
    readersDone = true;
  });
  const started = performance.now();
  const attack = await signInAttack(url, { password: LOAD_PASSWORD, target: spareEmails[0], bystander: spareEmails[1] });
  const when = `${readersDone ? 'partly after' : 'all while'} the readers ran (${((performance.now() - started) / 1000).toFixed(1)} s)`;
  return { ...(await readers), signInLimit: { ...attack, detail: `${attack.detail}; ${when}` } };
}

export async function runLoad(options: LoadOptions): Promise<LoadResult> {
  const server = await startLoadServer(options.connections);
  try {
    return await loadAgainst(server, options);
  } finally {
    await server.close();
  }
}
