import { z } from 'zod';

/** One field's validation message as the API reports it in `details.issues`. */
export type FieldIssue = { path: string; message: string };

const validationDetailsSchema = z.object({
  issues: z.array(z.object({ path: z.string(), message: z.string() })),
});

/** A non-2xx answer from the API: `{ error: { code, message, details? } }` with its HTTP status. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: unknown;

  constructor(status: number, code: string, message: string, details?: unknown) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }

  /** The per-field messages of a validation error (empty for other errors). */
  get issues(): FieldIssue[] {
    const parsed = validationDetailsSchema.safeParse(this.details);
    return parsed.success ? parsed.data.issues : [];
  }
}

export function isApiError(error: unknown, status?: number, code?: string): error is ApiError {
  return (
    error instanceof ApiError &&
    (status === undefined || error.status === status) &&
    (code === undefined || error.code === code)
  );
}
