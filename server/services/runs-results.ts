// Reading a finished run: who may (one light query per request), the per-step summary, and the
// map of any step of the shown replicate (one byte per patch, from the deflated chunk holding that
// step), both kept in memory once read.
import { promisify } from 'node:util';
import { gzip, inflate } from 'node:zlib';
import { QueryTypes, type Sequelize } from 'sequelize';
import { Membership, Run, RunFrame, RunResultRow, StudyArea, Team, type User } from '../models';
import { lookupCache } from './lookup-cache';
import { SIGNED_IN_LOOKUP_TTL_MS } from './short-lived-cache';
import { AppError, notFound } from '../http/errors';
import { FRAME_CHUNK_STEPS, type Role, type RunSummary } from '../../shared/schemas';
import { createResultsCache, type ResultsCache } from './results-cache';

const inflateAsync = promisify(inflate);
const gzipAsync = promisify(gzip);

/** Memory for the summaries and inflated map chunks of succeeded runs (a 250,000-patch chunk is 4 MB). */
const RESULTS_CACHE_BYTES = 64 * 2 ** 20;

/**
 * One cache per database (Sequelize instance): tests and benchmarks open several in one process, and
 * their run ids overlap. A succeeded run's results never change (only failed or cancelled runs are
 * retried), and each key carries the attempt besides.
 */
const caches = new WeakMap<Sequelize, ResultsCache>();
function cache(): ResultsCache {
  const database = Run.sequelize!;
  let found = caches.get(database);
  if (!found) caches.set(database, (found = createResultsCache(RESULTS_CACHE_BYTES)));
  return found;
}

/** What reading a run's results needs of it; a full RunAccess (downloads) is one too. */
export type ResultsAccess = { run: Pick<Run, 'id' | 'status' | 'error' | 'attempt' | 'steps' | 'inputsSummary'>; role: Role };

/** Who may read which succeeded run, reused while nothing about teams, members, study areas or runs changes here. */
const successAccess = lookupCache<string, ResultsAccess>('forget-results-access', SIGNED_IN_LOOKUP_TTL_MS, [Membership, Run, StudyArea, Team]);

async function readResultsAccess(runId: number, user: User): Promise<ResultsAccess | null> {
  const [found] = await Run.sequelize!.query<ResultsAccess['run'] & { role: Role }>(
    'SELECT r.id, r.status, r.error, r.attempt, r.steps, r.inputs_summary AS "inputsSummary", m.role FROM runs r JOIN memberships m ON m.team_id = r.team_id AND m.user_id = $2 WHERE r.id = $1',
    { bind: [runId, user.id], type: QueryTypes.SELECT },
  );
  if (!found) return null;
  const { role, ...run } = found;
  return { run, role };
}

/**
 * Those fields and the caller's role in the run's team in one plain query, as the map player asks
 * for every step; 404 unless the run exists and the caller belongs to its team (as runAccess).
 * Only a succeeded run's answer is reused: its status no longer changes (the job workers, in other
 * processes, change the status of runs still going).
 */
export async function resultsAccess(runId: number, user: User): Promise<ResultsAccess> {
  let read = null as ResultsAccess | null;
  const cached = await successAccess.get(`${runId}:${user.id}`, async () => {
    read = await readResultsAccess(runId, user);
    return read?.run.status === 'succeeded' ? read : null;
  });
  const found = cached ?? read;
  if (!found) throw notFound('Run');
  return found;
}

/** 409 unless the run has finished with results. */
export function requireSucceeded(access: ResultsAccess): void {
  const { run } = access;
  if (run.status === 'succeeded') return;
  const why = run.status === 'failed' ? `it failed: ${run.error ?? 'no reason recorded'}` : run.status === 'cancelled' ? 'it was cancelled' : `it is ${run.status}`;
  throw new AppError(409, 'run_not_finished', `Run ${run.id} has no results: ${why}.`);
}

/** The per-step summary as JSON, serialised once per run. */
export async function runSummaryJson(access: ResultsAccess): Promise<Buffer> {
  requireSucceeded(access);
  const { run } = access;
  return cache().get(`summary:${run.id}:${run.attempt}`, async () => {
    const row = await RunResultRow.findByPk(run.id, { attributes: ['summary'] });
    if (!row) throw new AppError(409, 'run_not_finished', `Run ${run.id} has no results yet.`);
    return Buffer.from(JSON.stringify(row.summary));
  });
}

/** The same JSON gzipped once, for clients that accept it (every browser): about a fifth of the bytes. */
export async function runSummaryGzip(access: ResultsAccess): Promise<Buffer> {
  const { run } = access;
  const json = await runSummaryJson(access);
  return cache().get(`summary-gzip:${run.id}:${run.attempt}`, () => gzipAsync(json));
}

export async function runSummary(access: ResultsAccess): Promise<RunSummary> {
  return JSON.parse((await runSummaryJson(access)).toString()) as RunSummary;
}

/** Patch states of the shown replicate at `step`, one byte (state index) per patch; a view of the cached chunk, not to be written. */
export async function runFrame(access: ResultsAccess, step: number): Promise<Buffer> {
  requireSucceeded(access);
  const { run } = access;
  if (step > run.steps) throw new AppError(400, 'invalid_input', `Invalid path: step must be between 0 and ${run.steps}, the run's last step.`);
  const chunkIndex = Math.floor(step / FRAME_CHUNK_STEPS);
  const chunk = await cache().get(`frames:${run.id}:${run.attempt}:${chunkIndex}`, async () => {
    const row = await RunFrame.findOne({ where: { runId: run.id, chunkIndex } });
    if (!row) throw new AppError(409, 'run_not_finished', `Run ${run.id} has no stored map for step ${step}.`);
    return inflateAsync(row.bytes);
  });
  const patches = run.inputsSummary.patchCount;
  const at = (step % FRAME_CHUNK_STEPS) * patches;
  return chunk.subarray(at, at + patches);
}
