// One validation step per route: parse the body, query or a path parameter with a shared zod schema.
import type { z } from 'zod';
import { AppError } from './errors';

export type ValidationIssue = { path: string; message: string };

export function parseInput<S extends z.ZodType>(schema: S, input: unknown, where: 'body' | 'query' | 'path'): z.infer<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const issues: ValidationIssue[] = result.error.issues.map((issue) => ({
    path: issue.path.join('.') || where,
    message: issue.message,
  }));
  const first = issues[0];
  throw new AppError(400, 'invalid_input', `Invalid ${where}: ${first.path === where ? '' : `${first.path}: `}${first.message}`, { issues });
}
