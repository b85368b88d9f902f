// The one error type of the API and the middleware that turns any error into
// `{ error: { code, message, details? } }` without leaking stack traces.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { MulterError } from 'multer';
import type { ApiErrorBody } from '../../shared/schemas';
import { BoundaryInputError } from '../../shared/geo';
import { MarkovInputError } from '../../shared/markov/errors';

export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export const notSignedIn = (): AppError => new AppError(401, 'not_signed_in', 'Sign in to continue.');
export const forbidden = (message: string): AppError => new AppError(403, 'forbidden', message);
export const notFound = (what: string): AppError => new AppError(404, 'not_found', `${what} was not found.`);

export function errorBody(err: AppError): ApiErrorBody {
  return { error: { code: err.code, message: err.message, ...(err.details === undefined ? {} : { details: err.details }) } };
}

/** Errors thrown by body-parser, multer and csrf-sync carry an HTTP status; keep it, with our wording. */
function fromHttpError(err: { status?: number; statusCode?: number; type?: string; code?: string; message?: string }): AppError | null {
  const status = err.status ?? err.statusCode;
  if (!status || status < 400 || status >= 500) return null;
  if (err.type === 'entity.too.large') {
    return new AppError(413, 'body_too_large', 'The request body is too large: send at most 100 kB of JSON (upload files through the file routes).');
  }
  if (err.type === 'entity.parse.failed') {
    return new AppError(400, 'malformed_json', 'The request body is not valid JSON: check quotes, commas and brackets.');
  }
  if (err.code === 'EBADCSRFTOKEN') {
    return new AppError(403, 'csrf_invalid', 'The form token is missing or out of date: reload the page and try again.');
  }
  return new AppError(status, 'bad_request', err.message ?? 'The request could not be read.');
}

/** Input errors raised by shared/ readers and by multer become 4xx answers with their own message. */
function fromInputError(err: unknown): AppError | null {
  if (err instanceof BoundaryInputError) return new AppError(400, `boundary_${err.code.replace(/-/g, '_')}`, `The file was refused: ${err.message}.`);
  if (err instanceof MarkovInputError) return new AppError(400, 'invalid_input', `The input was refused: ${err.message}.`);
  if (err instanceof MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return new AppError(413, 'file_too_large', 'The file is larger than 25 MB: simplify the boundary or zip it, and upload again.');
    return new AppError(400, 'bad_upload', `The upload could not be read (${err.message}): send one file in the form field "file" (for a map pair, one in "earlier" and one in "later").`);
  }
  return null;
}

export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const appError = err instanceof AppError ? err : (fromInputError(err) ?? fromHttpError(err as Record<string, never>));
    if (appError) {
      res.status(appError.status).json(errorBody(appError));
      return;
    }
    logger.error({ err, path: req.path }, 'unhandled error');
    res.status(500).json(errorBody(new AppError(500, 'internal', 'Something went wrong on our side; it has been logged.')));
  };
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not_found', `No API route ${req.method} ${req.originalUrl}.`));
};
