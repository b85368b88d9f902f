// Survey contracts (API under /api/v1):
//   GET    /study-areas/:studyAreaId/surveys                    → surveyListSchema
//   POST   /study-areas/:studyAreaId/surveys/inspect            multipart `file` → surveyInspectionSchema
//   POST   /study-areas/:studyAreaId/surveys                    multipart `file` + plotSurveyFieldsSchema → 201 surveyResponseSchema
//   POST   /study-areas/:studyAreaId/surveys/map-pair/inspect   multipart `earlier`, `later` → mapPairInspectionSchema
//   POST   /study-areas/:studyAreaId/surveys/map-pair           multipart `earlier`, `later` + mapPairFieldsSchema → 201 surveyResponseSchema
//   GET    /surveys/:surveyId                                   → surveyResponseSchema
//   PATCH  /surveys/:surveyId                                   updateSurveyBodySchema → surveyResponseSchema
//   DELETE /surveys/:surveyId                                   → 204 (phases that used it keep their matrix, lose the link)
//   GET    /surveys/:surveyId/files/:role                       → the original upload (attachment)
// Viewers read; owners and editors change; outsiders get 404.
import { z } from 'zod';
import { coverMapInspectionSchema } from './study-area';

const text = (what: string, max: number) =>
  z.string({ error: `${what} is required` }).trim().min(1, `${what} must not be empty`).max(max, `${what} must have at most ${max} characters`);

const column = (what: string) => z.string({ error: `${what} is required: the header of the column that holds the ${what.replace('Column', '')}` }).trim().min(1, `${what} must not be empty`);

/** Distinct values of one column with how many rows carry each (the 100 commonest). */
export const columnValuesSchema = z.object({
  name: z.string(),
  distinctCount: z.number().int(),
  values: z.array(z.object({ value: z.string(), count: z.number().int() })),
});

/** POST /study-areas/:studyAreaId/surveys/inspect (multipart `file`): what the column- and value-mapping steps need. */
export const surveyInspectionSchema = z.object({
  fileName: z.string(),
  columns: z.array(columnValuesSchema),
  rowCount: z.number().int(),
  /** The first rows as they are in the file (up to 5), aligned with `columns`. */
  sampleRows: z.array(z.array(z.string())),
  /** Columns whose header names look like the plot, time and state columns (e.g. "plot_id", "year", "cover_class"); null when none fits. */
  guessedColumns: z.object({ plot: z.string().nullable(), time: z.string().nullable(), state: z.string().nullable() }),
  /** For the guessed state column: each file label with the state code it seems to name (by code or name, any case), or null. */
  suggestedMapping: z.record(z.string(), z.string().nullable()),
});
export type SurveyInspection = z.infer<typeof surveyInspectionSchema>;

/**
 * JSON text of the value mapping: file label → state code, or null to leave the rows with that
 * label out (e.g. "not visited"). Every label in the file must appear.
 */
export const stateMappingSchema = z.record(z.string(), z.string().nullable(), { error: 'mapping must be a JSON object from the file\'s labels to state codes (or null to leave those rows out)' });
export type StateMapping = z.infer<typeof stateMappingSchema>;

const surveyCommonFields = {
  name: text('name', 120),
  notes: z.string().trim().max(5000, 'notes must have at most 5,000 characters').default(''),
  /** JSON text, see stateMappingSchema. */
  mapping: z.string({ error: 'mapping is required: a JSON object from the file\'s labels to state codes' }),
  confidenceLevel: z.coerce.number({ error: 'confidenceLevel must be a number' }).min(0.5, 'confidenceLevel must be at least 0.5').max(0.999, 'confidenceLevel must be at most 0.999').default(0.95),
};

/** Multipart text fields of POST /study-areas/:studyAreaId/surveys (the CSV comes as `file`). */
export const plotSurveyFieldsSchema = z.object({
  ...surveyCommonFields,
  plotColumn: column('plotColumn'),
  timeColumn: column('timeColumn'),
  stateColumn: column('stateColumn'),
  /** Time units per model step: only consecutive visits exactly this far apart are counted. */
  timeStep: z.coerce.number({ error: 'timeStep must be a number' }).positive('timeStep must be more than 0').default(1),
});
export type PlotSurveyFields = z.infer<typeof plotSurveyFieldsSchema>;

/** POST /study-areas/:studyAreaId/surveys/map-pair/inspect (multipart `earlier`, `later`). */
export const mapPairInspectionSchema = z.object({ earlier: coverMapInspectionSchema, later: coverMapInspectionSchema });
export type MapPairInspection = z.infer<typeof mapPairInspectionSchema>;

/** True for a day that exists: Date.parse refuses month 13 but rolls 2019-02-30 over to 2 March. */
const isCalendarDay = (s: string): boolean => !Number.isNaN(Date.parse(s)) && new Date(s).toISOString().startsWith(s);

const date = (what: string) =>
  z
    .string({ error: `${what} is required (YYYY-MM-DD)` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, `${what} must look like 2019-06-30`)
    .refine(isCalendarDay, `${what} is not a day of the calendar (check the month and the day)`);

/** Multipart text fields of POST /study-areas/:studyAreaId/surveys/map-pair (files `earlier` and `later`). */
export const mapPairFieldsSchema = z
  .object({
    ...surveyCommonFields,
    /** The attribute that names the cover, on both maps. */
    property: z.string({ error: 'property is required: the attribute that names the cover' }).trim().min(1, 'property must not be empty'),
    earlierDate: date('earlierDate'),
    laterDate: date('laterDate'),
  })
  .refine((f) => f.earlierDate < f.laterDate, { path: ['laterDate'], message: 'the later map must be dated after the earlier one' });
export type MapPairFields = z.infer<typeof mapPairFieldsSchema>;

/** PATCH /surveys/:surveyId */
export const updateSurveyBodySchema = z
  .object({ name: text('name', 120).optional(), notes: z.string().trim().max(5000).optional() })
  .refine((b) => b.name !== undefined || b.notes !== undefined, { message: 'send name or notes to change' });

const chiSquareSchema = z.object({ statistic: z.number(), dof: z.number().int(), pValue: z.number() }).nullable();
const grid = z.array(z.array(z.number().nullable()));

/** The stored estimate (shared/markov estimateMatrix), states by name in the study area's order. */
export const surveyEstimateSchema = z.object({
  states: z.array(z.string()),
  stateCodes: z.array(z.string()),
  counts: z.array(z.array(z.number().int())),
  /** MLE p̂_ij = n_ij / n_i; rows without data are all null. */
  matrix: grid,
  /** Wilson score interval per entry. */
  lower: grid,
  upper: grid,
  /** Goodman (1965) simultaneous intervals per row. */
  simultaneous: z.object({ lower: grid, upper: grid }),
  confidenceLevel: z.number(),
  rowsWithoutData: z.array(z.string()),
  pairsUsed: z.number().int(),
  /** Pairs not counted: how many, grouped by reason, and the first few. */
  pairsSkipped: z.object({
    total: z.number().int(),
    byReason: z.array(z.object({ reason: z.string(), count: z.number().int() })),
    examples: z.array(z.object({ plot: z.string(), fromTime: z.number(), toTime: z.number(), reason: z.string() })),
  }),
  tests: z.object({ independence: chiSquareSchema, homogeneity: chiSquareSchema }),
  /** Plain-language readings of the tests and of the data's gaps. */
  readings: z.array(z.string()),
});
export type SurveyEstimate = z.infer<typeof surveyEstimateSchema>;

export const surveyFileSchema = z.object({ role: z.enum(['table', 'earlier', 'later']), fileName: z.string(), sha256: z.string(), bytes: z.number().int() });

export const surveySummarySchema = z.object({
  id: z.number().int(),
  studyAreaId: z.number().int(),
  name: z.string(),
  notes: z.string(),
  kind: z.enum(['plots', 'map-pair']),
  pairsUsed: z.number().int(),
  rowsWithoutData: z.array(z.string()),
  createdBy: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type SurveySummary = z.infer<typeof surveySummarySchema>;
export const surveyListSchema = z.object({ surveys: z.array(surveySummarySchema) });

export const surveyDetailSchema = surveySummarySchema.extend({
  files: z.array(surveyFileSchema),
  /** How the file was read. */
  reading: z.discriminatedUnion('kind', [
    z.object({
      kind: z.literal('plots'),
      plotColumn: z.string(),
      timeColumn: z.string(),
      stateColumn: z.string(),
      timeStep: z.number(),
      observations: z.number().int(),
      plots: z.number().int(),
      /** Rows left out because their label was mapped to null. */
      rowsLeftOut: z.number().int(),
    }),
    z.object({
      kind: z.literal('map-pair'),
      property: z.string(),
      earlierDate: z.string(),
      laterDate: z.string(),
      /** Patches under no mapped polygon on each map. */
      unmatched: z.object({ earlier: z.number().int(), later: z.number().int() }),
    }),
  ]),
  mapping: stateMappingSchema,
  estimate: surveyEstimateSchema,
});
export type SurveyDetail = z.infer<typeof surveyDetailSchema>;
/** Answer of GET /surveys/:surveyId, PATCH and both create routes (201): `{ survey }`. */
export const surveyResponseSchema = z.object({ survey: surveyDetailSchema });
