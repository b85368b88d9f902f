// Fault: PostgreSQL restarted under traffic. The real server process runs on a throwaway cluster
// of its own (never the shared one) while signed-in reads and team creations, anonymous reads and
// health checks keep going; the cluster is stopped (fast shutdown: every session ended at once),
// left down for a while and started again. Meanwhile the server must answer 503
// database_unavailable with Retry-After, never a 500 and never hang; it must keep running and
// recover by itself, and the session, every acknowledged write and the job queue must come through.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { Op, type Sequelize } from 'sequelize';
import { connectDatabase } from '../../server/db';
import { startMailCatcher, type MailCatcher } from '../../server/mail/catcher';
import { Membership, Team } from '../../server/models';
import { prepareDatabase } from '../../server/scripts/prepare-database';
import { ACTIVE_RUN_STATUSES, type RunStatus } from '../../shared/schemas';
import { client, type Client } from '../support/client';
import { makeTeam, makeUser, PASSWORD } from '../support/people';
import { cinderFlatBoundary, uploadAs } from '../support/study-area-fixture';
import { startServerProcess, type ServerProcess } from './server-process';
import { startThrowawayCluster, type ThrowawayCluster } from './throwaway-cluster';
import { startTraffic, type Lane, type Sample } from './traffic';

/** How long the database stays away between its fast shutdown and its start. */
const DOWN_MS = 2_000;
/** Traffic before the fault and after the recovery. */
const STEADY_MS = 1_000;
/** The server must answer as usual again this soon after the database accepts connections. */
export const RECOVERY_LIMIT_MS = 10_000;
/** An answer later than this is a hang (the server's own connect timeout is 3 s). */
const HANG_MS = 10_000;
const RUN_LIMIT_MS = 30_000;
const WRITE_PREFIX = 'Restart write';
const LANES = { read: 'signed-in read', write: 'signed-in write', anonymous: 'anonymous read', health: 'health' } as const;

export type PostgresRestartResult = {
  name: string;
  injected: number;
  survived: boolean;
  nothingLost: boolean;
  detail: string;
  /** What the test asserts one by one; lists hold the offending answers or team names. */
  parts: {
    /** 503 answers while the database was away, per lane (all lanes need the database). */
    unavailable: Record<string, number>;
    /** 503 answers without Retry-After or without the database_unavailable error. */
    malformedUnavailable: Sample[];
    /** Answers other than the lane's usual one and 503: 500s, hangs, no answer, a lost session. */
    failures: Sample[];
    /** From the database accepting connections to the first usual answer of a signed-in read; null if none came. */
    recoveryMs: number | null;
    /** Unusual answers to requests sent after the recovery. */
    lateFailures: Sample[];
    serverAlive: boolean;
    /** A read and a write in the session signed in before the outage (with its CSRF token), after the recovery. */
    sessionAfter: [number, number];
    /** Teams whose creation was acknowledged but that are gone, or stored without their owner. */
    lost: string[];
    /** Teams stored in part (without their owner membership). */
    partial: string[];
    /** A run that succeeded before the outage, as read after it; a run queued after the recovery. */
    runBefore: RunStatus | string;
    runAfter: RunStatus | string;
  };
};

const sleep = (ms: number): Promise<void> => new Promise((r) => setTimeout(r, ms));

async function waitFor<T>(probe: () => T | undefined, limitMs: number): Promise<T | undefined> {
  const until = Date.now() + limitMs;
  for (let found = probe(); Date.now() < until; found = probe()) {
    if (found !== undefined) return found;
    await sleep(50);
  }
  return probe();
}

/** The status of an answer, 0 for none (the server gone). */
const statusOf = (answer: PromiseLike<{ status: number }>): Promise<number> => Promise.resolve(answer).then((res) => res.status, () => 0);

/** A study area on Cinder Flat with two cover states and a one-phase scenario on it; the scenario's id. */
async function makeScenario(c: Client, teamId: number): Promise<number> {
  const states = [
    { code: 'A', name: 'Shrub', colour: '#E69F00' },
    { code: 'B', name: 'Grass', colour: '#009E73' },
  ];
  const area = await uploadAs(c, `/api/v1/teams/${teamId}/study-areas`, { file: [cinderFlatBoundary, 'cinder-flat.geojson'] }, { name: 'Restart area', cellSize: '200', states: JSON.stringify(states) });
  if (area.status !== 201) throw new Error(`study area: ${area.status} ${JSON.stringify(area.body)}`);
  const areaId = area.body.studyArea.id as number;
  const cover = await c.put(`/api/v1/study-areas/${areaId}/start-cover`, { method: 'random', proportions: [0.6, 0.4], seed: 'restart' });
  if (cover.status !== 200) throw new Error(`start cover: ${cover.status}`);
  const scenario = await c.post(`/api/v1/study-areas/${areaId}/scenarios`, { name: 'Two states', phases: [{ fromStep: 0, toStep: null, matrix: [[0.8, 0.2], [0.3, 0.7]] }] });
  if (scenario.status !== 201) throw new Error(`scenario: ${scenario.status}`);
  return scenario.body.scenario.id as number;
}

/** Where the run ends up (or 'still active' after RUN_LIMIT_MS). */
async function runOutcome(c: Client, runId: number): Promise<RunStatus | string> {
  const until = Date.now() + RUN_LIMIT_MS;
  while (Date.now() < until) {
    const res = await c.get(`/api/v1/runs/${runId}`).catch(() => null);
    if (res?.status !== 200) return `read ${res?.status ?? 'unanswered'}`;
    const status = res.body.run.status as RunStatus;
    if (!ACTIVE_RUN_STATUSES.includes(status)) return status;
    await sleep(100);
  }
  return 'still active';
}

/** Starts a small run and follows it to its end; what went wrong instead, if it did not start. */
async function runToEnd(c: Client, scenarioId: number, seed: string): Promise<{ id: number | null; outcome: RunStatus | string }> {
  const res = await c.post(`/api/v1/scenarios/${scenarioId}/runs`, { steps: 10, replicates: 1, seed }).catch(() => null);
  if (res?.status !== 201) return { id: null, outcome: `not started (${res?.status ?? 'unanswered'})` };
  return { id: res.body.run.id as number, outcome: await runOutcome(c, res.body.run.id) };
}

/** Team creations acknowledged (201) and left in doubt (anything else), against what is stored. */
async function checkWrites(writes: Sample[], ownerId: number): Promise<{ acknowledged: number; inDoubt: number; lost: string[]; partial: string[] }> {
  const name = (s: Sample): string => `${WRITE_PREFIX} ${s.n}`;
  const acknowledged = writes.filter((s) => s.outcome === 201).map(name);
  const stored = await Team.findAll({ where: { name: { [Op.startsWith]: WRITE_PREFIX } } });
  const owned = new Set((await Membership.findAll({ where: { teamId: stored.map((t) => t.id), userId: ownerId, role: 'owner' } })).map((m) => m.teamId));
  const whole = new Set(stored.filter((t) => owned.has(t.id)).map((t) => t.name));
  return {
    acknowledged: acknowledged.length,
    inDoubt: writes.length - acknowledged.length,
    lost: acknowledged.filter((n) => !whole.has(n)),
    partial: stored.filter((t) => !owned.has(t.id)).map((t) => t.name),
  };
}

/** The traffic's samples through stop, wait and start of the cluster, and when the database was gone and back. */
async function throughRestart(cluster: ThrowawayCluster, lanes: Lane[]): Promise<{ samples: Sample[]; stoppingAt: number; upAt: number; recovered?: Sample }> {
  const traffic = startTraffic(lanes, { pauseMs: 50, timeoutMs: HANG_MS });
  await sleep(STEADY_MS);
  const stoppingAt = Date.now();
  await cluster.stop();
  await sleep(DOWN_MS);
  await cluster.start();
  const upAt = Date.now();
  const recovered = await waitFor(() => traffic.samples.find((s) => s.lane === LANES.read && s.outcome === s.expected && s.startedAt >= upAt), RECOVERY_LIMIT_MS);
  await sleep(STEADY_MS);
  await traffic.stop();
  return { samples: traffic.samples, stoppingAt, upAt, recovered };
}

const unusual = (s: Sample): boolean => s.outcome !== s.expected;

const tally = (samples: Sample[], key: (s: Sample) => string): string => {
  const counts = new Map<string, number>();
  for (const s of samples) counts.set(key(s), (counts.get(key(s)) ?? 0) + 1);
  return [...counts].map(([k, n]) => `${n} × ${k}`).join(', ');
};

/** The error lines of what a crashed Node.js process printed last (neither log lines nor stack frames). */
const dyingWords = (output: string): string =>
  output
    .split('\n')
    .filter((line) => /error/i.test(line) && !/^\s|^\{/.test(line))
    .slice(-2)
    .join(' | ');

export async function runPostgresRestart(): Promise<PostgresRestartResult> {
  let cluster: ThrowawayCluster | null = null;
  let sequelize: Sequelize | null = null;
  let catcher: MailCatcher | null = null;
  let server: ServerProcess | null = null;
  const outboxDir = mkdtempSync(path.join(tmpdir(), 'patchcast-restart-outbox-'));
  try {
    cluster = await startThrowawayCluster();
    const databaseUrl = cluster.url('patchcast');
    await prepareDatabase(databaseUrl, { seed: false });
    catcher = await startMailCatcher(outboxDir, 0);
    server = await startServerProcess({ DATABASE_URL: databaseUrl, SMTP_URL: `smtp://127.0.0.1:${catcher.port}`, OUTBOX_DIR: outboxDir });
    // This process's own connection, for the fixtures and for reading what was stored.
    sequelize = connectDatabase(databaseUrl);
    const person = await makeUser('Restart');
    const team = await makeTeam('Restart team', [[person, 'owner']]);
    const c = client(server.url);
    if ((await c.signIn(person.email, PASSWORD)).status !== 200) throw new Error('sign-in failed');
    const scenarioId = await makeScenario(c, team.id);
    // A run before the outage, so that the job queue is connected when the database goes away.
    const runBefore = await runToEnd(c, scenarioId, 'before');
    if (runBefore.outcome !== 'succeeded') throw new Error(`the run before the outage: ${runBefore.outcome}`);

    const token = await c.refreshCsrf();
    const serverUrl = server.url;
    const { samples, stoppingAt, upAt, recovered } = await throughRestart(cluster, [
      { name: LANES.read, expected: 200, send: () => c.get('/api/v1/teams') },
      { name: LANES.read, expected: 200, send: () => c.get('/api/v1/teams') },
      { name: LANES.write, expected: 201, send: (n) => c.agent.post('/api/v1/teams').set('x-csrf-token', token).send({ name: `${WRITE_PREFIX} ${n}` }) },
      // No cookie, so no session to load: straight to Sequelize (an unknown invitation is a 404).
      { name: LANES.anonymous, expected: 404, send: () => request(serverUrl).get('/api/v1/invitations/no-such-invitation') },
      { name: LANES.health, expected: 200, send: () => request(serverUrl).get('/api/v1/health') },
    ]);

    const unavailable = samples.filter((s) => s.outcome === 503);
    const recoveredAt = recovered?.endedAt ?? Infinity;
    const sessionAfter: [number, number] = [await statusOf(c.get('/api/v1/teams')), await statusOf(c.post('/api/v1/teams', { name: 'After the restart' }))];
    const writes = await checkWrites(samples.filter((s) => s.lane === LANES.write), person.id);
    const parts: PostgresRestartResult['parts'] = {
      unavailable: Object.fromEntries(Object.values(LANES).map((lane) => [lane, unavailable.filter((s) => s.lane === lane).length])),
      malformedUnavailable: unavailable.filter((s) => !s.retryAfter || s.errorCode !== 'database_unavailable' || !s.errorMessage?.includes('try again in a few seconds')),
      failures: samples.filter((s) => unusual(s) && s.outcome !== 503),
      recoveryMs: recovered ? recovered.endedAt - upAt : null,
      lateFailures: samples.filter((s) => s.startedAt > recoveredAt && unusual(s)),
      serverAlive: server.alive(),
      sessionAfter,
      lost: writes.lost,
      partial: writes.partial,
      runBefore: await runOutcome(c, runBefore.id!),
      runAfter: (await runToEnd(c, scenarioId, 'after')).outcome,
    };
    const survived = parts.serverAlive && parts.failures.length === 0 && parts.recoveryMs !== null && parts.recoveryMs <= RECOVERY_LIMIT_MS;
    const nothingLost = writes.lost.length === 0 && writes.partial.length === 0 && sessionAfter.join() === '200,201' && parts.runBefore === 'succeeded';
    const slowest = Math.max(...samples.map((s) => s.endedAt - s.startedAt));
    return {
      name: 'PostgreSQL restarted under traffic',
      injected: 1,
      survived,
      nothingLost,
      detail:
        `database away ${upAt - stoppingAt} ms; ${samples.length} requests (${tally(samples, (s) => String(s.outcome))}), slowest ${slowest} ms; ` +
        `503 by lane: ${tally(unavailable, (s) => s.lane)}; ` +
        `${parts.recoveryMs === null ? 'never back' : `back ${parts.recoveryMs} ms after the database`}; ` +
        `server process ${parts.serverAlive ? 'kept running' : `DIED (${dyingWords(server.output())})`}; ` +
        `${writes.acknowledged} acknowledged team creations all kept: ${writes.lost.length === 0 ? 'yes' : `NO, lost ${writes.lost.join(', ')}`}; ` +
        `${writes.inDoubt} in doubt, none stored in part: ${writes.partial.length === 0 ? 'yes' : `NO, partial ${writes.partial.join(', ')}`}; ` +
        `session after: ${sessionAfter.join('/')}; runs before/after: ${parts.runBefore}/${parts.runAfter}`,
      parts,
    };
  } finally {
    await server?.stop();
    await sequelize?.close();
    await catcher?.close();
    await cluster?.destroy();
    rmSync(outboxDir, { recursive: true, force: true });
  }
}
