// `npm run reliability`: the bad-input, fault and load tests through `npm test` (same preparation,
// throwaway databases), with the load run at its full length, then one table of what they recorded.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { RELIABILITY_LOG_ENV, type ReliabilityRow } from '../support/reliability-log';

const repoRoot = path.resolve(__dirname, '../..');

/** The test files that record reliability figures. */
const RELIABILITY_TESTS = ['tests/api/bad-input-corpus.test.ts', 'tests/api/run-faults.test.ts', 'tests/api/postgres-restart.test.ts', 'tests/api/smtp-down.test.ts', 'tests/api/load.test.ts'];

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

function main(): number {
  const log = path.join(mkdtempSync(path.join(tmpdir(), 'patchcast-reliability-')), 'rows.jsonl');
  const tests = spawnSync(process.execPath, ['--import', 'tsx', path.join(repoRoot, 'server/scripts/test.ts'), ...RELIABILITY_TESTS], {
    cwd: repoRoot,
    stdio: 'inherit',
    env: { ...process.env, [RELIABILITY_LOG_ENV]: log, PATCHCAST_LOAD_SECONDS: process.env.PATCHCAST_LOAD_SECONDS ?? '30', PATCHCAST_SKIP_WEB_BUILD: '1' },
  });
  const rows = existsSync(log) ? readFileSync(log, 'utf8').trim().split('\n').filter(Boolean).map((line) => JSON.parse(line) as ReliabilityRow) : [];
  process.stdout.write('\nReliability\n\n');
  printTable(rows);
  if (tests.status !== 0) process.stdout.write('\nSome reliability tests failed (see above): a missing row is a test that stopped before recording.\n');
  return tests.status ?? 1;
}

process.exit(main());
