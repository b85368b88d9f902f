// Each API or e2e test file gets its own database, cloned from the migrated template that
// `npm test` prepared (server/scripts/test.ts).
import { randomBytes } from 'node:crypto';
import pg from 'pg';

function serverUrl(): URL {
  const url = process.env.PATCHCAST_TEST_SERVER_URL;
  if (!url || !process.env.PATCHCAST_TEST_TEMPLATE) {
    throw new Error('Run the API and e2e tests through `npm test`, which prepares PostgreSQL and the template database.');
  }
  return new URL(url);
}

async function admin<T>(fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: serverUrl().toString() });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

export type TestDatabase = { url: string; drop(): Promise<void> };

export async function createTestDatabase(): Promise<TestDatabase> {
  const name = `${process.env.PATCHCAST_TEST_PREFIX ?? 'patchcast_test_0_'}${randomBytes(6).toString('hex')}`;
  await admin((c) => c.query(`CREATE DATABASE "${name}" TEMPLATE "${process.env.PATCHCAST_TEST_TEMPLATE}"`));
  const url = Object.assign(serverUrl(), { pathname: `/${name}` }).toString();
  return { url, drop: () => admin((c) => c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`)).then(() => undefined) };
}
