import { z } from 'zod';

/** Okabe–Ito colour-blind-safe palette: the default cover-state colours (brief §7). */
export const DEFAULT_STATE_COLOURS = ['#E69F00', '#56B4E9', '#009E73', '#F0E442', '#0072B2', '#D55E00', '#CC79A7', '#999999'] as const;
export const MIN_STATES = 2;
export const MAX_STATES = 12;

const text = (what: string, max: number) =>
  z.string({ error: `${what} is required` }).trim().min(1, `${what} must not be empty`).max(max, `${what} must have at most ${max} characters`);

export const coverStateSchema = z.object({
  code: z
    .string({ error: 'code is required' })
    .trim()
    .min(1, 'code must not be empty')
    .max(12, 'code must have at most 12 characters')
    .regex(/^[A-Za-z0-9_-]+$/, 'code may use letters, digits, - and _ only'),
  name: text('state name', 80),
  colour: z.string({ error: 'colour is required' }).regex(/^#[0-9A-Fa-f]{6}$/, 'colour must look like #3E7A5E'),
});
export type CoverState = z.infer<typeof coverStateSchema>;

/** PUT /study-areas/:id/states — the whole ordered list; codes and names must be unique. */
export const coverStatesBodySchema = z.object({
  states: z
    .array(coverStateSchema, { error: 'states must be a list' })
    .min(MIN_STATES, `a study area needs at least ${MIN_STATES} cover states`)
    .max(MAX_STATES, `a study area can have at most ${MAX_STATES} cover states`)
    .superRefine((states, ctx) => {
      for (const key of ['code', 'name'] as const) {
        const seen = new Map<string, number>();
        states.forEach((s, i) => {
          const k = s[key].toLowerCase();
          if (seen.has(k)) ctx.addIssue({ code: 'custom', path: [i, key], message: `${key} "${s[key]}" is used twice (states ${seen.get(k)! + 1} and ${i + 1})` });
          else seen.set(k, i);
        });
      }
    }),
});
export type CoverStatesBody = z.infer<typeof coverStatesBodySchema>;

/** Multipart text fields of POST /teams/:teamId/study-areas (the file comes as `file`). */
export const createStudyAreaFieldsSchema = z.object({
  name: text('name', 120),
  description: z.string().trim().max(2000, 'description must have at most 2,000 characters').default(''),
  cellSize: z.coerce.number({ error: 'cellSize must be a number of metres' }).min(10, 'cellSize must be at least 10 m').max(10_000, 'cellSize must be at most 10,000 m'),
  minFraction: z.coerce.number({ error: 'minFraction must be a number' }).min(0, 'minFraction must be at least 0').lt(1, 'minFraction must be below 1').default(0),
  pickProperty: z.string().trim().max(200).optional(),
  pickValue: z.string().trim().max(500).optional(),
  /** JSON text of the cover-state list. */
  states: z.string({ error: 'states is required (a JSON list of {code, name, colour})' }),
});
export type CreateStudyAreaFields = z.infer<typeof createStudyAreaFieldsSchema>;

/** Multipart text fields of POST /teams/:teamId/study-areas/preview. */
export const previewFieldsSchema = createStudyAreaFieldsSchema.pick({ pickProperty: true, pickValue: true });

export const lonLatSchema = z.tuple([z.number(), z.number()]);

/** What the preview answers: the validated outline for drawing, and what the grid needs to be estimated in the browser. */
export const boundaryPreviewSchema = z.object({
  parts: z.array(z.array(z.array(lonLatSchema))),
  format: z.string(),
  sourceCrs: z.string(),
  vertexCount: z.number().int(),
  areaM2: z.number(),
  notes: z.array(z.string()),
  warnings: z.array(z.string()),
});
export type BoundaryPreview = z.infer<typeof boundaryPreviewSchema>;

export const gridSpecSchema = z.object({
  projection: z.string(),
  originX: z.number(),
  originY: z.number(),
  cellSize: z.number(),
  rows: z.number().int(),
  cols: z.number().int(),
});

export const studyAreaSummarySchema = z.object({
  id: z.number().int(),
  teamId: z.number().int(),
  name: z.string(),
  description: z.string(),
  cellSizeM: z.number(),
  patchCount: z.number().int(),
  totalAreaM2: z.number(),
  boundaryAreaM2: z.number(),
  stateCount: z.number().int(),
  createdAt: z.string(),
});
export type StudyAreaSummary = z.infer<typeof studyAreaSummarySchema>;
export const studyAreaListSchema = z.object({ studyAreas: z.array(studyAreaSummarySchema) });

export const studyAreaDetailSchema = studyAreaSummarySchema.extend({
  minFraction: z.number(),
  boundary: boundaryPreviewSchema,
  grid: gridSpecSchema,
  states: z.array(coverStateSchema),
  source: z.object({ fileName: z.string(), format: z.string(), sha256: z.string(), bytes: z.number().int() }),
  createdBy: z.string(),
});
export type StudyAreaDetail = z.infer<typeof studyAreaDetailSchema>;

/** PATCH /study-areas/:id */
export const renameStudyAreaBodySchema = z
  .object({ name: text('name', 120).optional(), description: z.string().trim().max(2000).optional() })
  .refine((b) => b.name !== undefined || b.description !== undefined, { message: 'send name or description to change' });

/** PUT /study-areas/:id/start-cover — by proportions, one per cover state in order. */
export const proportionsStartCoverBodySchema = z.object({
  method: z.enum(['random', 'exact'], { error: 'method must be "random" (each patch draws) or "exact" (rounded counts, shuffled)' }),
  proportions: z.array(z.number({ error: 'each proportion must be a number' }).min(0, 'proportions must be ≥ 0').max(1, 'proportions must be ≤ 1'), { error: 'proportions must be a list of numbers' }),
  seed: z.string().trim().min(1).max(100).optional(),
});
export type ProportionsStartCoverBody = z.infer<typeof proportionsStartCoverBodySchema>;

export const startCoverSummarySchema = z.object({
  method: z.enum(['random', 'exact', 'cover-map']),
  seed: z.string().nullable(),
  proportions: z.array(z.number()).nullable(),
  /** Per cover state, in order: patches and area at step 0. */
  patches: z.array(z.number().int()),
  areaM2: z.array(z.number()),
  unmatchedCount: z.number().int(),
  sourceName: z.string().nullable(),
  updatedAt: z.string(),
});
export type StartCoverSummary = z.infer<typeof startCoverSummarySchema>;

/** GET /study-areas/:id/patches — the grid compactly: little-endian Int32 cell indices and Float32 areas (m²), base64. */
export const patchGridResponseSchema = z.object({
  grid: gridSpecSchema,
  patchCount: z.number().int(),
  cells: z.string(),
  areas: z.string(),
});
export type PatchGridResponse = z.infer<typeof patchGridResponseSchema>;

/** POST /study-areas/:id/start-cover/map/inspect (multipart `file`) — the cover map's attribute names and values. */
export const coverMapInspectionSchema = z.object({
  featureCount: z.number().int(),
  properties: z.array(
    z.object({
      name: z.string(),
      /** Distinct values with how many polygons carry each (the 100 commonest). */
      values: z.array(z.object({ value: z.string(), count: z.number().int() })),
    }),
  ),
  warnings: z.array(z.string()),
});
export type CoverMapInspection = z.infer<typeof coverMapInspectionSchema>;

/** Multipart text fields of POST /study-areas/:id/start-cover/map (with the file as `file`). */
export const coverMapFieldsSchema = z.object({
  property: z.string({ error: 'property is required: the attribute that names the cover' }).trim().min(1, 'property must not be empty'),
  /** JSON text: an object from the map's values to cover-state codes. */
  mapping: z.string({ error: 'mapping is required: a JSON object from map values to state codes' }),
  /** Code of the state given to patches under no polygon or with an unmapped value; required when there are any. */
  fallback: z.string().trim().optional(),
});
export type CoverMapFields = z.infer<typeof coverMapFieldsSchema>;
