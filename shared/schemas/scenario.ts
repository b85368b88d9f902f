// Scenario contracts (API under /api/v1; answers `{ error: { code, message, details? } }` on failure):
//   GET    /study-areas/:studyAreaId/scenarios            → scenarioListSchema
//   POST   /study-areas/:studyAreaId/scenarios            scenarioBodySchema → 201 scenarioResponseSchema
//   GET    /scenarios/:scenarioId                         → scenarioResponseSchema
//   PUT    /scenarios/:scenarioId                         scenarioBodySchema → scenarioResponseSchema
//   POST   /scenarios/:scenarioId/duplicate               duplicateScenarioBodySchema → 201 scenarioResponseSchema
//   DELETE /scenarios/:scenarioId                         → 204
//   POST   /scenarios/:scenarioId/phases/:index/use-survey useSurveyBodySchema → scenarioResponseSchema
//   GET    /scenarios/:scenarioId/analysis?steps=50       → scenarioAnalysisSchema
//   GET    /scenarios/:scenarioId/uncertainty?draws=1000&seed=… → scenarioUncertaintySchema
// Viewers read; owners and editors change; outsiders get 404.
import { z } from 'zod';
import { coverStateSchema } from './study-area';

export const MAX_PHASES = 5;

const text = (what: string, max: number) =>
  z.string({ error: `${what} is required` }).trim().min(1, `${what} must not be empty`).max(max, `${what} must have at most ${max} characters`);

const step = (what: string) =>
  z.number({ error: `${what} must be a whole number of steps` }).int(`${what} must be a whole number of steps`).min(0, `${what} must be 0 or more`);

/**
 * One phase: the transitions from step t to t + 1 for fromStep ≤ t < toStep (toStep null: to the
 * end) use `matrix`, row-stochastic (row = state now, column = state next step), rows and columns
 * in the study area's state order. Whether each row sums to 1 is checked by the server, which names
 * every bad row and cell.
 */
export const phaseInputSchema = z.object({
  fromStep: step('fromStep'),
  toStep: step('toStep').nullable(),
  matrix: z.array(z.array(z.number({ error: 'each matrix entry must be a number' }), { error: 'each matrix row must be a list of numbers' }), {
    error: 'matrix must be a list of rows',
  }),
  /** The survey this matrix was estimated from (kept by "use this estimate"); null when typed in. */
  surveyId: z.number().int().positive().nullable().default(null),
});
export type PhaseInput = z.infer<typeof phaseInputSchema>;

/** 1–5 phases that tile the steps: the first starts at 0, each starts where the previous ends, only the last is open-ended. */
export const phasesSchema = z
  .array(phaseInputSchema, { error: 'phases must be a list' })
  .min(1, 'a scenario needs at least one phase')
  .max(MAX_PHASES, `a scenario can have at most ${MAX_PHASES} phases`)
  .superRefine((phases, ctx) => {
    phases.forEach((p, n) => {
      const label = `phase ${n + 1}`;
      if (n === 0 && p.fromStep !== 0) ctx.addIssue({ code: 'custom', path: [n, 'fromStep'], message: `${label} starts at step ${p.fromStep}; the first phase must start at step 0` });
      if (n > 0) {
        const previousEnd = phases[n - 1].toStep;
        if (previousEnd !== null && p.fromStep !== previousEnd) {
          ctx.addIssue({ code: 'custom', path: [n, 'fromStep'], message: `${label} starts at step ${p.fromStep} but phase ${n} ends at step ${previousEnd}; start it at ${previousEnd} so no steps are left out or doubled` });
        }
      }
      if (p.toStep === null && n < phases.length - 1) ctx.addIssue({ code: 'custom', path: [n, 'toStep'], message: `${label} has no end step; only the last phase may run to the end` });
      if (p.toStep !== null && p.toStep <= p.fromStep) ctx.addIssue({ code: 'custom', path: [n, 'toStep'], message: `${label} ends at step ${p.toStep}; it must end after its start (step ${p.fromStep})` });
    });
  });

/** Start cover of a scenario: the study area's own (its start-cover setting), or proportions of its own. */
export const scenarioStartCoverSchema = z.discriminatedUnion(
  'source',
  [
    z.object({ source: z.literal('study-area') }),
    z.object({
      source: z.literal('proportions'),
      method: z.enum(['random', 'exact'], { error: 'method must be "random" (each patch draws) or "exact" (rounded counts, shuffled)' }),
      proportions: z.array(z.number({ error: 'each proportion must be a number' }).min(0, 'proportions must be ≥ 0').max(1, 'proportions must be ≤ 1'), { error: 'proportions must be a list of numbers' }),
      seed: z.string().trim().min(1).max(100).optional(),
    }),
  ],
  { error: 'startCover.source must be "study-area" or "proportions"' },
);
export type ScenarioStartCover = z.infer<typeof scenarioStartCoverSchema>;

/** POST /study-areas/:studyAreaId/scenarios and PUT /scenarios/:scenarioId — the whole scenario. */
export const scenarioBodySchema = z.object({
  name: text('name', 120),
  notes: z.string().trim().max(5000, 'notes must have at most 5,000 characters').default(''),
  yearsPerStep: z.number({ error: 'yearsPerStep must be a number' }).positive('yearsPerStep must be more than 0').max(100, 'yearsPerStep must be at most 100').default(1),
  startCover: scenarioStartCoverSchema.default({ source: 'study-area' }),
  phases: phasesSchema,
});
export type ScenarioBody = z.input<typeof scenarioBodySchema>;
export type ScenarioInput = z.output<typeof scenarioBodySchema>;

/** POST /scenarios/:scenarioId/duplicate — the copy's name (default: "<name> (copy)"). */
export const duplicateScenarioBodySchema = z.object({ name: text('name', 120).optional() });

/** POST /scenarios/:scenarioId/phases/:index/use-survey (index 0-based). */
export const useSurveyBodySchema = z.object({ surveyId: z.number({ error: 'surveyId must be a survey id' }).int().positive() });
export const phaseIndexParamSchema = z.coerce.number({ error: 'phase index must be a number' }).int().min(0, 'phase index starts at 0').max(MAX_PHASES - 1, `phase index is at most ${MAX_PHASES - 1}`);

export const scenarioSummarySchema = z.object({
  id: z.number().int(),
  studyAreaId: z.number().int(),
  name: z.string(),
  notes: z.string(),
  yearsPerStep: z.number(),
  phaseCount: z.number().int(),
  /** Surveys behind any phase's matrix. */
  surveyIds: z.array(z.number().int()),
  createdBy: z.string(),
  createdAt: z.string(),
  updatedBy: z.string(),
  updatedAt: z.string(),
});
export type ScenarioSummary = z.infer<typeof scenarioSummarySchema>;
export const scenarioListSchema = z.object({ scenarios: z.array(scenarioSummarySchema) });

export const phaseSchema = z.object({
  fromStep: z.number().int(),
  toStep: z.number().int().nullable(),
  matrix: z.array(z.array(z.number())),
  surveyId: z.number().int().nullable(),
  /** The linked survey, null when typed in or when the survey was deleted. */
  survey: z.object({ id: z.number().int(), name: z.string() }).nullable(),
});
export type ScenarioPhase = z.infer<typeof phaseSchema>;

export const scenarioDetailSchema = scenarioSummarySchema.extend({
  startCover: scenarioStartCoverSchema,
  phases: z.array(phaseSchema),
  /** State codes the matrices were saved against, in order. */
  stateCodes: z.array(z.string()),
  /** False when the study area's states changed since: the matrices must be edited before analysis. */
  fitsStudyArea: z.boolean(),
});
export type ScenarioDetail = z.infer<typeof scenarioDetailSchema>;
/** Answer of GET/POST/PUT scenario routes, duplicate and use-survey: `{ scenario }`. */
export const scenarioResponseSchema = z.object({ scenario: scenarioDetailSchema });

/** Numbers that can be infinite in the engine ("never") travel as null. */
const finiteOrNever = z.number().nullable();

/** shared/markov's ChainAnalysis as JSON: states by name; null where the engine says Infinity. */
export const chainAnalysisSchema = z.object({
  states: z.array(z.string()),
  stationary: z.array(z.number()).nullable(),
  stationaryByClass: z.array(z.object({ class: z.array(z.string()), distribution: z.array(z.number()) })),
  classes: z.object({ communicating: z.array(z.array(z.string())), closed: z.array(z.array(z.string())), transient: z.array(z.string()) }),
  absorbing: z.array(z.string()),
  period: z.array(z.object({ class: z.array(z.string()), period: z.number().int() })),
  lambda2Modulus: z.number(),
  /** null: infinite (|λ₂| = 0, settles in one step). */
  dampingRatio: finiteOrNever,
  /** null: the state is never left (absorbing). */
  residenceSteps: z.array(finiteOrNever),
  /** null: never returns (transient). */
  meanRecurrence: z.array(finiteOrNever),
  meanFirstPassage: z.array(z.array(finiteOrNever)).nullable(),
  absorption: z.object({ expectedSteps: z.array(z.number()), probabilities: z.array(z.array(z.number())) }).nullable(),
  projection: z.array(z.object({ t: z.number().int(), distribution: z.array(z.number()) })),
  mixingTime: z.number().int().nullable(),
  mixingStart: z.enum(['initial', 'worst single-state start']),
  mixingLimit: z.number().int(),
});
export type ChainAnalysisJson = z.infer<typeof chainAnalysisSchema>;

export const phaseAnalysisSchema = z.object({
  index: z.number().int(),
  fromStep: z.number().int(),
  toStep: z.number().int().nullable(),
  surveyId: z.number().int().nullable(),
  chain: chainAnalysisSchema,
  /** π_j × the study area's total area (m²), per state; null when there is no unique π. */
  longRunAreaM2: z.array(z.number()).nullable(),
  /** Mixing time × yearsPerStep; null with the mixing time. Mixing is measured from the expected cover at the phase's start. */
  mixingYears: z.number().nullable(),
  /** Residence steps × yearsPerStep (null: never left). */
  residenceYears: z.array(finiteOrNever),
  /** Plain-language readings: reducible chain, several closed classes, periodic chain, absorbing states, slow mixing. */
  warnings: z.array(z.string()),
});
export type PhaseAnalysis = z.infer<typeof phaseAnalysisSchema>;

/** GET /scenarios/:scenarioId/analysis?steps=50 */
export const analysisQuerySchema = z.object({
  steps: z.coerce.number({ error: 'steps must be a number' }).int('steps must be a whole number').min(1, 'steps must be at least 1').max(1000, 'steps must be at most 1,000').default(50),
});

export const scenarioAnalysisSchema = z.object({
  scenarioId: z.number().int(),
  states: z.array(coverStateSchema),
  totalAreaM2: z.number(),
  yearsPerStep: z.number(),
  /** Area shares at step 0 and where they came from ('none': no start cover set, uniform shares used). */
  start: z.object({ source: z.enum(['study-area', 'proportions', 'none']), shares: z.array(z.number()) }),
  /** Expected path x_t = x_0 P(t)…, area shares for t = 0…steps, across the phases. */
  expectedPath: z.array(z.array(z.number())),
  phases: z.array(phaseAnalysisSchema),
  /** The standing caution (brief §8). */
  caution: z.string(),
});
export type ScenarioAnalysis = z.infer<typeof scenarioAnalysisSchema>;

/** GET /scenarios/:scenarioId/uncertainty?draws=1000&seed=… */
export const uncertaintyQuerySchema = z.object({
  draws: z.coerce.number({ error: 'draws must be a number' }).int('draws must be a whole number').min(100, 'draws must be at least 100').max(5000, 'draws must be at most 5,000').default(1000),
  seed: z.string().trim().min(1).max(100).optional(),
});

export const shareRangeSchema = z.object({ state: z.string(), median: z.number(), lower: z.number(), upper: z.number() });

export const phaseUncertaintySchema = z.object({
  index: z.number().int(),
  surveyId: z.number().int().nullable(),
  /** null when the phase's matrix was typed in (no counts to draw from), with the reason. */
  longRun: z.array(shareRangeSchema).nullable(),
  reason: z.string().nullable(),
  /** Draws whose chain had no unique long-run shares; left out of the ranges. */
  drawsWithoutUniqueShares: z.number().int(),
  /** False when the phase's matrix was edited after it was taken from the survey: ranges describe the survey estimate. */
  matrixMatchesSurvey: z.boolean(),
});

export const scenarioUncertaintySchema = z.object({
  scenarioId: z.number().int(),
  /** Symmetric Dirichlet prior per cell (0.5: Jeffreys), the number of draws, the seed, and the range's quantiles. */
  prior: z.number(),
  draws: z.number().int(),
  seed: z.string(),
  quantiles: z.tuple([z.number(), z.number()]),
  phases: z.array(phaseUncertaintySchema),
  method: z.string(),
});
export type ScenarioUncertainty = z.infer<typeof scenarioUncertaintySchema>;
