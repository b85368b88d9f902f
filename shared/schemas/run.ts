// Run contracts (API under /api/v1; answers `{ error: { code, message, details? } }` on failure):
//   POST /scenarios/:scenarioId/runs       startRunBodySchema → 201 runResponseSchema
//   GET  /study-areas/:studyAreaId/runs    → runListSchema
//   GET  /runs/:runId                      → runResponseSchema
//   POST /runs/:runId/cancel               → runResponseSchema
//   POST /runs/:runId/retry                → runResponseSchema (the same frozen inputs, run again)
//   GET  /runs/:runId/summary              → runSummarySchema
//   GET  /runs/:runId/frames/:step         → application/octet-stream, one byte (state index) per patch
//   GET  /notices                          → noticeListSchema
//   POST /notices/:noticeId/read           → noticeResponseSchema
// Viewers read; owners and editors start, cancel and retry; outsiders get 404.
import { z } from 'zod';
import { coverStateSchema } from './study-area';

export const MAX_RUN_STEPS = 1000;
export const MAX_RUN_REPLICATES = 500;
/** Cap on patches × steps × replicates (patch-steps simulated by one run). */
export const MAX_PATCH_STEPS = 5e9;
/** Cap on the kept patch states of the shown replicate: (steps + 1) × patches bytes. */
export const MAX_HISTORY_BYTES = 256 * 1024 * 1024;
/** Runs of one team that may be queued or running at once. */
export const MAX_ACTIVE_RUNS_PER_TEAM = 3;
/** Steps per compressed chunk of the shown replicate's patch states. */
export const FRAME_CHUNK_STEPS = 16;

export const RUN_CAUTION =
  'Forecasts are model output under a stationary Markov assumption estimated from limited data; they are not predictions of what will happen on the ground. ' +
  'Check them against field monitoring, state the data and matrix behind every chart, and follow the land-management agency’s guidance and local regulations before acting on them.';

/** POST /scenarios/:scenarioId/runs */
export const startRunBodySchema = z.object({
  steps: z
    .number({ error: 'steps must be a whole number' })
    .int('steps must be a whole number')
    .min(1, 'steps must be at least 1')
    .max(MAX_RUN_STEPS, `steps must be at most ${MAX_RUN_STEPS.toLocaleString('en-US')}`),
  /** Default: the scenario's years per step. */
  yearsPerStep: z.number({ error: 'yearsPerStep must be a number' }).positive('yearsPerStep must be more than 0').max(100, 'yearsPerStep must be at most 100').optional(),
  replicates: z
    .number({ error: 'replicates must be a whole number' })
    .int('replicates must be a whole number')
    .min(1, 'replicates must be at least 1')
    .max(MAX_RUN_REPLICATES, `replicates must be at most ${MAX_RUN_REPLICATES}`),
  /** Default: a random seed, always returned so that the run can be repeated. */
  seed: z.string({ error: 'seed must be text' }).trim().min(1, 'seed must not be empty').max(100, 'seed must have at most 100 characters').optional(),
});
export type StartRunBody = z.input<typeof startRunBodySchema>;
export type StartRunInput = z.output<typeof startRunBodySchema>;

export const runStatusSchema = z.enum(['queued', 'running', 'merging', 'succeeded', 'failed', 'cancelled']);
export type RunStatus = z.infer<typeof runStatusSchema>;
export const ACTIVE_RUN_STATUSES: readonly RunStatus[] = ['queued', 'running', 'merging'];

/** What a run was made from, frozen at start. */
export const runInputsSummarySchema = z.object({
  scenarioName: z.string(),
  studyAreaName: z.string(),
  states: z.array(coverStateSchema),
  patchCount: z.number().int(),
  totalAreaM2: z.number(),
  cellSizeM: z.number(),
  startCover: z.string(),
  phases: z.array(z.object({ fromStep: z.number().int(), toStep: z.number().int().nullable(), matrix: z.array(z.array(z.number())) })),
});
export type RunInputsSummary = z.infer<typeof runInputsSummarySchema>;

export const runProgressSchema = z.object({
  shardsDone: z.number().int(),
  shardCount: z.number().int(),
  /** 0–100. */
  percent: z.number(),
  /** Estimated seconds left; null until the first shard is done or once the run has ended. */
  secondsLeft: z.number().nullable(),
});
export type RunProgress = z.infer<typeof runProgressSchema>;

export const runSchema = z.object({
  id: z.number().int(),
  studyAreaId: z.number().int(),
  scenarioId: z.number().int().nullable(),
  status: runStatusSchema,
  steps: z.number().int(),
  yearsPerStep: z.number(),
  replicates: z.number().int(),
  seed: z.string(),
  /** SHA-256 of the canonical frozen inputs and settings: equal fingerprints give byte-identical results. */
  fingerprint: z.string(),
  /** 0-based replicate whose patch states are kept for every step. */
  shownReplicate: z.number().int(),
  inputs: runInputsSummarySchema,
  progress: runProgressSchema,
  /** Why the run failed; null otherwise. */
  error: z.string().nullable(),
  attempt: z.number().int(),
  createdBy: z.string(),
  createdAt: z.string(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
  caution: z.string(),
});
export type Run = z.infer<typeof runSchema>;
export const runResponseSchema = z.object({ run: runSchema });
export const runListSchema = z.object({ runs: z.array(runSchema) });

export const quantileSetSchema = z.object({ mean: z.number(), median: z.number(), p5: z.number(), p95: z.number() });
export type QuantileSet = z.infer<typeof quantileSetSchema>;

/** GET /runs/:runId/summary — over replicates, per step and state; area in m², share 0–1. */
export const runSummarySchema = z.object({
  runId: z.number().int(),
  states: z.array(coverStateSchema),
  steps: z.number().int(),
  yearsPerStep: z.number(),
  replicates: z.number().int(),
  totalAreaM2: z.number(),
  /** area[step][state], share[step][state]. */
  area: z.array(z.array(quantileSetSchema)),
  share: z.array(z.array(quantileSetSchema)),
  /** Expected path x_t = x_0 P(t)… as area shares, from the frozen start cover and phases. */
  expectedShare: z.array(z.array(z.number())),
  method: z.string(),
  caution: z.string(),
});
export type RunSummary = z.infer<typeof runSummarySchema>;

export const stepParamSchema = z.coerce.number({ error: 'step must be a number' }).int('step must be a whole number').min(0, 'step must be 0 or more');

export const noticeSchema = z.object({
  id: z.number().int(),
  message: z.string(),
  /** App path to open, e.g. /study-areas/3/runs/12. */
  link: z.string().nullable(),
  runId: z.number().int().nullable(),
  createdAt: z.string(),
  readAt: z.string().nullable(),
});
export type Notice = z.infer<typeof noticeSchema>;
export const noticeListSchema = z.object({ notices: z.array(noticeSchema), unread: z.number().int() });
export const noticeResponseSchema = z.object({ notice: noticeSchema });
