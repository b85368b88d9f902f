// The API reads JSON bodies, and multipart/form-data on the upload routes. Any other body
// (text/plain, XML, a url-encoded form) would reach the routes as no body at all and be refused
// for missing fields; answer 415 Unsupported Media Type instead (RFC 9110 §15.5.16), naming the type.
import type { RequestHandler } from 'express';
import { AppError } from './errors';

/** A request carries a body when it says how long it is or that it is chunked (RFC 9112 §6.3). */
const hasBody = (headers: Record<string, string | string[] | undefined>): boolean =>
  headers['transfer-encoding'] !== undefined || (headers['content-length'] !== undefined && headers['content-length'] !== '0');

export const jsonOrMultipartBodies: RequestHandler = (req, _res, next) => {
  if (!hasBody(req.headers) || req.is(['application/json', 'multipart/form-data'])) return next();
  const type = req.headers['content-type'] ? `"${req.headers['content-type']}"` : 'of no stated type';
  next(new AppError(415, 'unsupported_media_type', `The request body is ${type}: send JSON with Content-Type: application/json (or a file upload as multipart/form-data).`));
};
