// The one error type of the API and the middleware that turns any error into
// `{ error: { code, message, details? } }` without leaking stack traces.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { MulterError } from 'multer';
import { ConnectionError } from 'sequelize';
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

/** Seconds a client should wait before trying again after a 503 (the Retry-After header, RFC 9110 §10.2.3). */
export const RETRY_AFTER_SECONDS = 5;

export const databaseUnavailable = (): AppError =>
  new AppError(503, 'database_unavailable', 'The database is not answering (it may be restarting); try again in a few seconds.');

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
  // Text read from a file (a feature's name, a plot id) can reach a jsonb column, which refuses
  // \u0000 (PostgreSQL docs, JSON Types) with SQLSTATE 22P05; the write's transaction is rolled back.
  if ((err as { parent?: { code?: unknown } } | null)?.parent?.code === '22P05') {
    return new AppError(400, 'nul_character', 'A name or label holds a NUL character (\\u0000), which cannot be stored: remove it (from the file, if it came from one) and send again.');
  }
  return null;
}

/**
 * SQLSTATEs of a server that is going away or not there yet (PostgreSQL manual, appendix A "PostgreSQL
 * Error Codes"): class 08 connection exception, 57P01 admin_shutdown, 57P02 crash_shutdown, 57P03
 * cannot_connect_now (starting up or shutting down).
 */
const UNAVAILABLE_SQLSTATE = /^(08[0-9A-Z]{3}|57P0[123])$/;
/** Socket errors of a connection refused, cut or unanswered (Node.js, "Common system errors"). */
const UNAVAILABLE_SOCKET = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH']);
/** node-postgres sets no code when a connection ends under a query or cannot be made in time. */
const UNAVAILABLE_MESSAGE = /^(Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error)/;

type MaybeDatabaseError = { code?: unknown; message?: unknown; parent?: unknown; original?: unknown };

/** The database is unreachable: Sequelize's connection errors, or a pg error (maybe wrapped by Sequelize) of a lost server. */
function isDatabaseUnavailable(err: unknown, depth = 0): boolean {
  if (err instanceof ConnectionError) return true;
  if (!err || typeof err !== 'object' || depth > 3) return false;
  const { code, message, parent, original } = err as MaybeDatabaseError;
  if (typeof code === 'string' && (UNAVAILABLE_SQLSTATE.test(code) || UNAVAILABLE_SOCKET.has(code))) return true;
  if (typeof message === 'string' && UNAVAILABLE_MESSAGE.test(message)) return true;
  // Sequelize's DatabaseError keeps the driver's error as `parent` (and `original`).
  return [parent, original].some((inner) => isDatabaseUnavailable(inner, depth + 1));
}

export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (res.headersSent) {
      // Too late to answer otherwise: express-session, say, saves the session as the answer ends.
      // A half-sent answer is cut off (as Express's default handler does) rather than left hanging.
      logger.warn({ err, path: req.path }, 'error after the answer started');
      if (!res.writableEnded) req.socket.destroy();
      return;
    }
    const appError = err instanceof AppError ? err : isDatabaseUnavailable(err) ? databaseUnavailable() : (fromInputError(err) ?? fromHttpError(err as Record<string, never>));
    if (appError) {
      // Every 503 of this API is a passing outage (database, job queue).
      if (appError.status === 503) res.set('Retry-After', String(RETRY_AFTER_SECONDS));
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
