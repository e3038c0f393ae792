import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from '../core/errors.ts';

/**
 * Multipart upload of up to `maxFiles` text files, all in the field `file`, kept in memory
 * (small CSVs). Multer's own errors become 400/413 in plain words, as for single uploads.
 */
export function textUploads(maxBytes: number, maxFiles: number): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: maxFiles, fields: 40, fieldSize: 10_000 } }).array('file', maxFiles);
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError('payload_too_large', `A file is larger than ${Math.round(maxBytes / 1024)} kB; nothing was saved.`));
        if (err.code === 'LIMIT_FILE_COUNT' || err.code === 'LIMIT_UNEXPECTED_FILE') {
          return next(new HttpError('bad_request', `Send at most ${maxFiles} files, each in the field "file"; nothing was saved.`));
        }
        return next(new HttpError('bad_request', `The upload was refused (${err.message.toLowerCase()}); nothing was saved.`));
      }
      // Busboy's own errors (cut-off form, bad boundary, malformed part header) are the client's; found by tests/fuzz.
      next(new HttpError('bad_request', `The upload could not be read as a form (${String((err as Error)?.message ?? err).toLowerCase()}); nothing was saved.`));
    });
  };
}

/** The uploaded files' bytes (decoded in a worker thread); a 400 naming the file when one is not text. */
export function uploadedTextsBytes(files: unknown): { content: Buffer; filename: string; bytes: number }[] {
  const list = Array.isArray(files) ? (files as Express.Multer.File[]) : [];
  return list.map((file) => {
    if (file.buffer.includes(0)) throw new HttpError('bad_request', `${file.originalname} is not a text file; upload CSV files. Nothing was saved.`, [{ path: 'file', message: 'not a text file' }]);
    return { content: file.buffer, filename: file.originalname.slice(0, 200) || 'upload.csv', bytes: file.size };
  });
}
