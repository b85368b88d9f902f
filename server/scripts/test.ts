// `npm test`: the same preparation as `npm start`, against throwaway databases, then jest.
// A template database is migrated once; each API or e2e test file clones it (CREATE DATABASE …
// TEMPLATE …), so files are isolated and fast. Extra arguments go to jest.
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import pg from 'pg';
import { repoRoot } from '../config';
import { buildWebIfChanged } from './build-web';
import { ensureLocalCluster } from './postgres';
import { prepareDatabase } from './prepare-database';
import { ensureDebianPackages } from './system';

// Names carry this run's process id, so concurrent `npm test` runs on one server never touch
// each other's databases; leftovers of runs that died are dropped at the next start.
const RUN_PREFIX = `patchcast_test_${process.pid}_`;
const TEMPLATE = `${RUN_PREFIX}template`;

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/** Debian packages the tests use as outside references or drivers (probe file for each). */
const testPackages = {
  chromium: '/usr/bin/chromium',
  'gdal-bin': '/usr/bin/ogr2ogr',
  'python3-numpy': '/usr/lib/python3/dist-packages/numpy/__init__.py',
};

/** Drops this run's databases and those of runs whose process is gone. */
async function dropTestDatabases(adminUrl: string): Promise<void> {
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    const { rows } = await client.query<{ datname: string }>("SELECT datname FROM pg_database WHERE datname LIKE 'patchcast\\_test\\_%'");
    for (const { datname } of rows) {
      const pid = Number(/^patchcast_test_(\d+)_/.exec(datname)?.[1]);
      if (datname.startsWith(RUN_PREFIX) || !pid || !isAlive(pid)) await client.query(`DROP DATABASE IF EXISTS "${datname}" WITH (FORCE)`);
    }
  } finally {
    await client.end();
  }
}

async function main(): Promise<number> {
  const cluster = process.env.DATABASE_URL ? null : ensureLocalCluster();
  const serverUrl = new URL(process.env.DATABASE_URL ?? cluster!.adminUrl('postgres'));
  const urlFor = (db: string): string => Object.assign(new URL(serverUrl), { pathname: `/${db}` }).toString();

  await dropTestDatabases(urlFor('postgres'));
  await prepareDatabase(urlFor(TEMPLATE), { seed: false });
  ensureDebianPackages(testPackages, 'the test suite');
  // API-only work can skip the bundle: PATCHCAST_SKIP_WEB_BUILD=1 npm test -- --selectProjects api
  if (!process.env.PATCHCAST_SKIP_WEB_BUILD) buildWebIfChanged();

  const jest = spawnSync(process.execPath, [path.join(repoRoot, 'node_modules', 'jest', 'bin', 'jest.js'), '--runInBand', ...process.argv.slice(2)], {
    cwd: repoRoot,
    stdio: 'inherit',
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PATCHCAST_TEST_SERVER_URL: urlFor('postgres'),
      PATCHCAST_TEST_TEMPLATE: TEMPLATE,
      PATCHCAST_TEST_PREFIX: RUN_PREFIX,
    },
  });

  await dropTestDatabases(urlFor('postgres'));
  cluster?.stop();
  return jest.status ?? 1;
}

main()
  .then((code) => process.exit(code))
  .catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
