// Fault: PostgreSQL restarted under traffic, on a throwaway cluster of this file's own
// (tests/reliability/postgres-restart.ts). The server answers 503 meanwhile and recovers by itself,
// without a restart, and nothing is lost.
import { recordReliability } from '../support/reliability-log';
import { RECOVERY_LIMIT_MS, runPostgresRestart, type PostgresRestartResult } from '../reliability/postgres-restart';
import { destroyThrowawayClusters } from '../reliability/throwaway-cluster';

let result: PostgresRestartResult;

beforeAll(async () => {
  result = await runPostgresRestart();
  const { name, injected, survived, nothingLost, detail } = result;
  recordReliability({ kind: 'fault', name, injected, survived, nothingLost, detail });
});

// runPostgresRestart removes its cluster itself; this is for one left by a test that timed out.
afterAll(() => destroyThrowawayClusters());

describe('when PostgreSQL is stopped for two seconds and started again while signed-in reads and writes keep coming', () => {
  test('then requests during the outage (signed in or not, and /health) are answered 503 database_unavailable with Retry-After', () => {
    for (const count of Object.values(result.parts.unavailable)) expect(count).toBeGreaterThan(0);
    expect(result.parts.malformedUnavailable).toEqual([]);
  });

  test('then no request gets a 500, hangs or goes unanswered, and the server process keeps running', () => {
    expect(result.parts.failures).toEqual([]);
    expect(result.parts.serverAlive).toBe(true);
  });

  test(`then the server answers as usual again within ${RECOVERY_LIMIT_MS / 1000} s of the database being back, and keeps doing so (/health too)`, () => {
    expect(result.parts.recoveryMs).not.toBeNull();
    expect(result.parts.recoveryMs!).toBeLessThanOrEqual(RECOVERY_LIMIT_MS);
    expect(result.parts.lateFailures).toEqual([]);
  });

  test('then the session signed in before the outage still reads and writes (its CSRF token too)', () => {
    expect(result.parts.sessionAfter).toEqual([200, 201]);
  });

  test('then every acknowledged write is kept, and every write in doubt is stored whole or not at all', () => {
    expect(result.parts.lost).toEqual([]);
    expect(result.parts.partial).toEqual([]);
    expect(result.parts.runBefore).toBe('succeeded');
  });

  test('then a run queued after the recovery goes through the job queue to the end', () => {
    expect(result.parts.runAfter).toBe('succeeded');
  });

  test('then the reliability row says it survived and lost nothing', () => {
    expect({ survived: result.survived, nothingLost: result.nothingLost, detail: result.detail }).toEqual({ survived: true, nothingLost: true, detail: expect.any(String) });
  });
});
