import type { z } from 'zod';

import { isApiError, type FieldIssue } from './ApiError';

/** Per-field messages keyed by the first path segment, first message wins, sentence-cased. */
export type FieldErrors = Partial<Record<string, string>>;

function sentenceCase(message: string): string {
  return message.charAt(0).toUpperCase() + message.slice(1);
}

function collect(issues: ReadonlyArray<FieldIssue>): FieldErrors {
  const errors: FieldErrors = {};
  for (const { path, message } of issues) {
    const field = path.split('.')[0] || 'form';
    errors[field] ??= sentenceCase(message);
  }
  return errors;
}

/** The server's validation messages, from an `ApiError` (empty for anything else). */
export function serverFieldErrors(error: unknown): FieldErrors {
  return isApiError(error) ? collect(error.issues) : {};
}

/** Validates a form with the same shared schema the server uses; returns the body or the messages. */
export function validateForm<T>(
  schema: z.ZodType<T>,
  values: unknown,
): { ok: true; body: T } | { ok: false; errors: FieldErrors } {
  const parsed = schema.safeParse(values);
  if (parsed.success) return { ok: true, body: parsed.data };
  return {
    ok: false,
    errors: collect(parsed.error.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message }))),
  };
}
