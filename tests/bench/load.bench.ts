// 100 signed-in readers on loopback for 30 s (tests/reliability/load.ts: run summaries and step
// maps of finished runs), alone and beside a sign-in attack, and two baselines measured in this
// invocation on the same server with the same connections and duration: the health route (one
// SELECT 1, no session) and /auth/me (the session and its user, no run). Target: p99 ≤ 150 ms
// with 0 errors. Uses its own database on the local cluster.
import { loadavg } from 'node:os';
import { cannon, type CannonFigures } from '../reliability/cannon';
import { healthAgainst, loadAgainst, readersAgainst } from '../reliability/load';
import { startLoadServer } from '../reliability/load-server';

const OPTIONS = { durationSeconds: 30, connections: 100 };
const TARGET_P99_MS = 150;

const line = (text: string): void => {
  process.stdout.write(`${text}\n`);
};
const load = (): string => loadavg().map((l) => l.toFixed(2)).join(' ');
const figures = (f: CannonFigures): string =>
  `${(f.requests / OPTIONS.durationSeconds).toFixed(0).padStart(5)} req/s  p50 ${String(f.p50Ms).padStart(4)} ms  p99 ${String(f.p99Ms).padStart(4)} ms  errors ${f.errors}  non-2xx ${f.non2xx}`;

export async function bench(): Promise<void> {
  const server = await startLoadServer(OPTIONS.connections);
  try {
    line(`load on loopback: ${OPTIONS.connections} connections × ${OPTIONS.durationSeconds} s, ${server.runs.length} finished runs (load average before: ${load()})`);
    const health = await healthAgainst(server, OPTIONS);
    line(`  health route (SELECT 1, no session)            ${figures(health)}  (load ${load()})`);
    const me = await cannon(server.url, OPTIONS, (i) => [{ method: 'GET', path: '/api/v1/auth/me', headers: { cookie: server.readerCookies[i] } }]);
    line(`  /auth/me (session and user, no run)            ${figures(me)}  (load ${load()})`);
    const alone = await readersAgainst(server, OPTIONS);
    line(`  readers alone: run summaries and step maps     ${figures(alone)}  (load ${load()})`);
    const readers = await loadAgainst(server, OPTIONS);
    line(`  readers beside a sign-in attack (bcrypt)       ${figures(readers)}  (load ${load()})`);
    line(`  readers p99 / health p99 ${(readers.p99Ms / Math.max(1, health.p99Ms)).toFixed(2)}, / /auth/me p99 ${(readers.p99Ms / Math.max(1, me.p99Ms)).toFixed(2)}; p99 ${alone.p99Ms} ms alone, ${readers.p99Ms} ms beside the attack (target ≤ ${TARGET_P99_MS} ms)`);
    line(`  sign-in limits under load: per address ${readers.signInLimit.perAddress ? 'hold' : 'FAIL'}, per account ${readers.signInLimit.perAccount ? 'hold' : 'FAIL'} (${readers.signInLimit.detail})`);
  } finally {
    await server.close();
  }
}
