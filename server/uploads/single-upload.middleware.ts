import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from '../core/errors.ts';

/**
 * Multipart upload of one text file in field `file`, kept in memory (files here are small CSVs).
 * Multer's own errors (too large, wrong field, too many parts) become 400/413 with plain words
 * instead of reaching the error handler as unknown errors.
 */
export function singleTextUpload(maxBytes: number): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 20, fieldSize: 10_000 } }).single('file');
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError('payload_too_large', `The file is larger than ${Math.round(maxBytes / 1024)} kB; nothing was saved.`));
        return next(new HttpError('bad_request', `The upload was refused (${err.message.toLowerCase()}); send one file in the field "file".`));
      }
      // Busboy's own errors (cut-off form, bad boundary, malformed part header) are the client's; found by tests/fuzz.
      next(new HttpError('bad_request', `The upload could not be read as a form (${String((err as Error)?.message ?? err).toLowerCase()}); nothing was saved.`));
    });
  };
}

/**
 * The uploaded file's bytes, or a 400 when there is none or it is not text. A big file is handed
 * to a worker thread as bytes and decoded there, not on the request thread.
 */
export function uploadedTextBytes(file: Express.Multer.File | undefined): { content: Buffer; filename: string; bytes: number } {
  if (!file) throw new HttpError('bad_request', 'Choose a file to upload.', [{ path: 'file', message: 'Required' }]);
  if (file.buffer.includes(0)) throw new HttpError('bad_request', `${file.originalname} is not a text file; upload a CSV.`, [{ path: 'file', message: 'not a text file' }]);
  const filename = file.originalname.slice(0, 200) || 'upload.csv';
  return { content: file.buffer, filename, bytes: file.size };
}

/** The uploaded file as UTF-8 text, or a 400 when there is none or it is not text. */
export function uploadedText(file: Express.Multer.File | undefined): { text: string; filename: string; bytes: number } {
  const { content, filename, bytes } = uploadedTextBytes(file);
  return { text: content.toString('utf8'), filename, bytes };
}
