import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { CliInputError } from '../../../server/cli/args';
import * as analyze from '../../../server/cli/analyze';
import * as estimate from '../../../server/cli/estimate';
import * as simulate from '../../../server/cli/simulate';

const dir = mkdtempSync(join(tmpdir(), 'patchcast-cli-'));
const file = (name: string, text: string): string => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};
// Land of Oz (Grinstead & Snell, Introduction to Probability, ch. 11.1).
const oz = file('oz.csv', 'from,R,N,S\nR,0.5,0.25,0.25\nN,0.5,0,0.5\nS,0.25,0.25,0.5\n');

async function capture(run: (argv: string[]) => Promise<void>, argv: string[]): Promise<string> {
  const chunks: string[] = [];
  const spy = jest.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => {
    chunks.push(String(chunk));
    return true;
  });
  try {
    await run(argv);
  } finally {
    spy.mockRestore();
  }
  return chunks.join('');
}

test('analyze --json prints exactly the documented keys, π = (.4, .2, .4) for the Land of Oz', async () => {
  const out = JSON.parse(await capture(analyze.run, ['--matrix', oz, '--steps', '1,5', '--initial', '1,0,0', '--json'])) as Record<string, unknown>;
  expect(Object.keys(out)).toEqual([
    'states', 'stationary', 'stationaryByClass', 'classes', 'absorbing', 'period', 'lambda2Modulus', 'dampingRatio',
    'residenceSteps', 'meanRecurrence', 'meanFirstPassage', 'absorption', 'projection', 'mixingTime',
  ]);
  (out.stationary as number[]).forEach((v, i) => expect(v).toBeCloseTo([0.4, 0.2, 0.4][i], 12));
  expect((out.projection as { t: number }[]).map((p) => p.t)).toEqual([1, 5]);
  expect(out.absorption).toBeNull();
});

test('simulate --json: T + 1 count rows summing to N, reproducible from the seed', async () => {
  const argv = ['--matrix', oz, '--patches', '5000', '--steps', '4', '--replicates', '2', '--seed', 'cli', '--json'];
  const a = JSON.parse(await capture(simulate.run, argv)) as { counts: number[][]; meanCounts: number[][]; states: string[] };
  expect(a.states).toEqual(['R', 'N', 'S']);
  expect(a.counts).toHaveLength(5);
  a.counts.forEach((row) => expect(row.reduce((s, v) => s + v, 0)).toBe(5000));
  expect(JSON.parse(await capture(simulate.run, argv))).toEqual(a);
  const bench = JSON.parse(await capture(simulate.run, [...argv.slice(0, 8), '--bench'])) as Record<string, number>;
  expect(Object.keys(bench)).toEqual(['patchStepsPerSecond']);
  expect(bench.patchStepsPerSecond).toBeGreaterThan(0);
});

test('estimate --json with custom columns and a fixed state order', async () => {
  const obs = file('obs.csv', 'site,year,cover\nq,1,B\nq,2,A\nq,3,A\nr,1,A\nr,3,B\n');
  const out = JSON.parse(await capture(estimate.run, ['--observations', obs, '--plot-col', 'site', '--time-col', 'year', '--state-col', 'cover', '--states', 'A,B', '--json'])) as Record<string, unknown>;
  expect(Object.keys(out)).toEqual(['states', 'counts', 'matrix', 'lower', 'upper', 'simultaneous', 'confidenceLevel', 'pairsUsed', 'pairsSkipped', 'tests']);
  expect(out.counts).toEqual([[1, 0], [1, 0]]);
  expect(out.pairsUsed).toBe(2);
  expect((out.pairsSkipped as unknown[]).length).toBe(1);
});

test('bad input throws a CliInputError naming the file and the place', async () => {
  const bad = file('bad.csv', 'from,A,B\nA,0.5,0.4\nB,0.5,0.5\n');
  await expect(analyze.run(['--matrix', bad])).rejects.toThrow(CliInputError);
  await expect(analyze.run(['--matrix', bad])).rejects.toThrow(/bad\.csv: line 2 \(from 'A'\) sums to 0\.9/);
  await expect(analyze.run(['--matrix', oz, '--initial', '0.5,0.5'])).rejects.toThrow(/--initial: the start distribution has 2 shares for 3 states/);
  await expect(simulate.run(['--matrix', oz, '--patches', '0', '--steps', '3'])).rejects.toThrow(/--patches must be at least 1/);
  await expect(analyze.run(['--matrix', join(dir, 'missing.csv')])).rejects.toThrow(/cannot read the file \(ENOENT\)/);
});

test('the CLI exits 2 with one line on stderr for bad input', () => {
  const bad = file('neg.csv', 'from,A,B\nA,-0.5,1.5\nB,0.5,0.5\n');
  const result = spawnSync(process.execPath, ['--import', 'tsx', join(__dirname, '..', '..', '..', 'server', 'cli.ts'), 'analyze', '--matrix', bad], { encoding: 'utf8' });
  expect(result.status).toBe(2);
  expect(result.stderr.trim().split('\n')).toHaveLength(1);
  expect(result.stderr).toMatch(/neg\.csv: line 2, column 'A' \(from 'A'\): -0\.5 is negative/);
});
