// `npm run bench`: runs every tests/bench/*.bench.ts in turn. Each file exports
// `bench(): Promise<void>` and prints its own lines; benchmarks print ratios, they are not tests.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { ensureDebianPackages } from '../../server/scripts/system';

type BenchModule = { bench: () => Promise<void> };

/** The reference implementations the benchmarks run beside ours (probe file for each). */
const referencePackages = {
  'python3-numpy': '/usr/lib/python3/dist-packages/numpy/__init__.py',
  gcc: '/usr/bin/gcc',
};

async function main(): Promise<void> {
  ensureDebianPackages(referencePackages, 'the benchmarks');
  const only = process.argv[2];
  const files = readdirSync(__dirname)
    .filter((name) => name.endsWith('.bench.ts') && (!only || name.includes(only)))
    .sort();
  for (const name of files) {
    process.stdout.write(`\n== ${name}\n`);
    const mod = (await import(join(__dirname, name))) as BenchModule;
    await mod.bench();
  }
}

main().catch((err: unknown) => {
  process.stderr.write(`${err instanceof Error ? (err.stack ?? err.message) : String(err)}\n`);
  process.exit(1);
});
