// File uploads (multer, kept in memory): one file per request (or the two of a map pair), at most 25 MB each.
import type { Request } from 'express';
import multer from 'multer';

export const UPLOAD_LIMIT_BYTES = 25 * 1024 * 1024;

const upload = (files: number): multer.Multer => multer({ storage: multer.memoryStorage(), limits: { fileSize: UPLOAD_LIMIT_BYTES, files, fields: 20 } });

export const singleUpload = upload(1).single('file');

/** The two dated maps of a map-pair survey, as the form fields `earlier` and `later`. */
export const mapPairUpload = upload(2).fields([
  { name: 'earlier', maxCount: 1 },
  { name: 'later', maxCount: 1 },
]);

/** The files that mapPairUpload received, by field. */
export function mapPairFiles(req: Request): { earlier?: Express.Multer.File; later?: Express.Multer.File } {
  const files = (req.files ?? {}) as Record<string, Express.Multer.File[] | undefined>;
  return { earlier: files.earlier?.[0], later: files.later?.[0] };
}
