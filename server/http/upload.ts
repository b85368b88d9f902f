// File uploads (multer, kept in memory): one file per request, at most 25 MB.
import multer from 'multer';

export const UPLOAD_LIMIT_BYTES = 25 * 1024 * 1024;

export const singleUpload = multer({ storage: multer.memoryStorage(), limits: { fileSize: UPLOAD_LIMIT_BYTES, files: 1, fields: 20 } }).single('file');
