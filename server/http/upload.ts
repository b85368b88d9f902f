// File uploads (multer, kept in memory): one file per request (or the two of a map pair), at most 25 MB each.
import type { Request, RequestHandler } from 'express';
import multer, { MulterError } from 'multer';
import { AppError } from './errors';

export const UPLOAD_LIMIT_BYTES = 25 * 1024 * 1024;

const upload = (files: number): multer.Multer => multer({ storage: multer.memoryStorage(), limits: { fileSize: UPLOAD_LIMIT_BYTES, files, fields: 20 } });

/**
 * multer hands on busboy's own parse errors (a multipart type without a boundary, a body cut off
 * before its closing boundary) as plain Errors; they are the client's, so they become a 400.
 */
function readable(middleware: RequestHandler): RequestHandler {
  return (req, res, next) =>
    middleware(req, res, (err?: unknown) => {
      if (err === undefined || err instanceof MulterError || err instanceof AppError) return next(err);
      const reason = err instanceof Error ? err.message : String(err);
      next(new AppError(400, 'bad_upload', `The upload is not a complete multipart/form-data body (${reason}): send the file as a form upload, with the boundary its Content-Type names.`));
    });
}

export const singleUpload = readable(upload(1).single('file'));

/** The two dated maps of a map-pair survey, as the form fields `earlier` and `later`. */
export const mapPairUpload = readable(
  upload(2).fields([
    { name: 'earlier', maxCount: 1 },
    { name: 'later', maxCount: 1 },
  ]),
);

/** The files that mapPairUpload received, by field. */
export function mapPairFiles(req: Request): { earlier?: Express.Multer.File; later?: Express.Multer.File } {
  const files = (req.files ?? {}) as Record<string, Express.Multer.File[] | undefined>;
  return { earlier: files.earlier?.[0], later: files.later?.[0] };
}
