// One validation step per route: parse the body, query or a path parameter with a shared zod schema.
import type { z } from 'zod';
import { AppError } from './errors';

export type ValidationIssue = { path: string; message: string };

/** Where a string (value or key) holds U+0000, e.g. "name" or "phases.0.notes"; null when none does. */
function nulPath(value: unknown, path: string[] = []): string | null {
  if (typeof value === 'string') return value.includes('\u0000') ? path.join('.') : null;
  if (typeof value !== 'object' || value === null) return null;
  for (const [key, inner] of Object.entries(value)) {
    if (key.includes('\u0000')) return [...path, JSON.stringify(key)].join('.');
    const found = nulPath(inner, [...path, key]);
    if (found !== null) return found;
  }
  return null;
}

export function parseInput<S extends z.ZodType>(schema: S, input: unknown, where: 'body' | 'query' | 'path'): z.infer<S> {
  const result = schema.safeParse(input);
  if (result.success) {
    // PostgreSQL text cannot hold NUL (PostgreSQL docs, Character Types) and Sequelize would store
    // it as the two characters "\0" (its escaping, sequelize/lib/sql-string.js): refuse it, never save it altered.
    const at = nulPath(result.data);
    if (at !== null) {
      throw new AppError(400, 'nul_character', `Invalid ${where}: ${at || where} contains a NUL character (\\u0000), which cannot be stored; remove it and send again.`);
    }
    return result.data;
  }
  const issues: ValidationIssue[] = result.error.issues.map((issue) => ({
    path: issue.path.join('.') || where,
    message: issue.message,
  }));
  const first = issues[0];
  throw new AppError(400, 'invalid_input', `Invalid ${where}: ${first.path === where ? '' : `${first.path}: `}${first.message}`, { issues });
}
