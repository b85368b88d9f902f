// `npm run reliability`: the bad-input and fault tests through `npm test` (same preparation,
// throwaway databases), then the full load run (100 readers × 30 s) in this process, outside jest,
// whose module sandbox slows a server down; then one table of what they recorded.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { RELIABILITY_LOG_ENV, type ReliabilityRow } from '../support/reliability-log';
import type { CannonFigures } from './cannon';
import { healthAgainst, loadAgainst, readersAgainst, type LoadResult } from './load';
import { startLoadServer } from './load-server';

const repoRoot = path.resolve(__dirname, '../..');

/** The test files that record reliability figures. */
const RELIABILITY_TESTS = ['tests/api/bad-input-corpus.test.ts', 'tests/api/run-faults.test.ts', 'tests/api/postgres-restart.test.ts', 'tests/api/smtp-down.test.ts'];
const LOAD = { connections: 100, durationSeconds: 30 };
/** Reading first, not counted: figures of a server past its JIT warm-up and first reads, as load tests commonly take them. */
const WARM_UP_SECONDS = 5;
/** The readers' p99 target, printed beside the figure; the run fails on errors or a sign-in limit that gave way. */
const LOAD_TARGET_P99_MS = 150;

const yesNo = (ok: boolean): string => (ok ? 'yes' : 'NO');

function cells(row: ReliabilityRow): [string, string, string] {
  switch (row.kind) {
    case 'bad input':
      return [`bad input: ${row.name}`, `${row.tried} tried / ${row.refusedCleanly} refused cleanly`, row.detail];
    case 'fault':
      return [`fault: ${row.name}`, `${row.injected} injected / survived ${yesNo(row.survived)} / nothing lost ${yesNo(row.nothingLost)}`, row.detail];
    case 'load':
      return [`load: ${row.name}`, `p50 ${row.p50Ms} ms / p99 ${row.p99Ms} ms / ${row.errors} errors (${row.requests} requests)`, row.detail];
  }
}

function printTable(rows: ReliabilityRow[]): void {
  const table = [['check', 'result', 'detail'], ...rows.map(cells)];
  const widths = [0, 1].map((c) => Math.max(...table.map((r) => r[c].length)));
  for (const [i, [check, result, detail]] of table.entries()) {
    process.stdout.write(`${check.padEnd(widths[0])}  ${result.padEnd(widths[1])}  ${detail}\n`);
    if (i === 0) process.stdout.write(`${'-'.repeat(widths[0])}  ${'-'.repeat(widths[1])}  ${'-'.repeat(6)}\n`);
  }
}

/** The readers beside the sign-in attack, after a warm-up and the health-route baseline on the same server (how fast this machine is now). */
async function measureLoad(): Promise<{ health: CannonFigures; result: LoadResult }> {
  const server = await startLoadServer(LOAD.connections);
  try {
    await readersAgainst(server, { ...LOAD, durationSeconds: WARM_UP_SECONDS });
    const health = await healthAgainst(server, LOAD);
    return { health, result: await loadAgainst(server, LOAD) };
  } finally {
    await server.close();
  }
}

async function loadRow(): Promise<{ row: ReliabilityRow; ok: boolean }> {
  const { health, result } = await measureLoad();
  const limits = result.signInLimit.perAddress && result.signInLimit.perAccount;
  const row: ReliabilityRow = {
    kind: 'load',
    name: `${LOAD.connections} readers × ${LOAD.durationSeconds} s`,
    requests: result.requests,
    p50Ms: result.p50Ms,
    p99Ms: result.p99Ms,
    errors: result.errors + result.non2xx,
    detail: `p99 target ≤ ${LOAD_TARGET_P99_MS} ms; baseline on this machine now: health route (SELECT 1, no session) p50 ${health.p50Ms} ms / p99 ${health.p99Ms} ms; after ${WARM_UP_SECONDS} s of warm-up, not counted; sign-in limits ${limits ? 'held' : 'FAILED'}: ${result.signInLimit.detail}`,
  };
  return { row, ok: limits && result.errors === 0 && result.non2xx === 0 };
}

async function main(): Promise<number> {
  const log = path.join(mkdtempSync(path.join(tmpdir(), 'patchcast-reliability-')), 'rows.jsonl');
  const tests = spawnSync(process.execPath, ['--import', 'tsx', path.join(repoRoot, 'server/scripts/test.ts'), ...RELIABILITY_TESTS], {
    cwd: repoRoot,
    stdio: 'inherit',
    env: { ...process.env, [RELIABILITY_LOG_ENV]: log, PATCHCAST_SKIP_WEB_BUILD: '1' },
  });
  const rows = existsSync(log) ? readFileSync(log, 'utf8').trim().split('\n').filter(Boolean).map((line) => JSON.parse(line) as ReliabilityRow) : [];
  process.stdout.write(`\nLoad: ${LOAD.connections} signed-in readers for ${LOAD.durationSeconds} s…\n`);
  const load = await loadRow();
  process.stdout.write('\nReliability\n\n');
  printTable([...rows, load.row]);
  if (tests.status !== 0) process.stdout.write('\nSome reliability tests failed (see above): a missing row is a test that stopped before recording.\n');
  return tests.status === 0 && load.ok ? 0 : 1;
}

main()
  .then((code) => process.exit(code))
  .catch((err: unknown) => {
    process.stderr.write(`${err instanceof Error ? (err.stack ?? err.message) : String(err)}\n`);
    process.exit(1);
  });
