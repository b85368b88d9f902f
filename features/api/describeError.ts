import { ApiError } from './ApiError';

/**
 * A sentence for the person about what went wrong, or null when nothing did. Validation errors
 * point at the fields, which show the server's messages inline.
 */
export function describeError(error: unknown): string | null {
  if (error === null || error === undefined) return null;
  if (error instanceof ApiError) return error.issues.length > 0 ? 'Check the fields marked below.' : error.message;
  if (error instanceof TypeError) {
    return 'Patchcast could not reach its server. Check your connection and try again.';
  }
  return 'Something went wrong. Try again.';
}
