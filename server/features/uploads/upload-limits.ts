import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from '../../middleware/http-error';

export const PHOTO_MAX_BYTES = 15 * 1024 * 1024;
export const PDF_MAX_BYTES = 10 * 1024 * 1024;
/** Photos per request, and per lot in all. */
export const PHOTOS_PER_REQUEST = 8;
export const PHOTOS_PER_LOT = 20;

const MB = (bytes: number) => `${bytes / 1024 / 1024} MB`;

/**
 * multer in memory with hard limits, its errors turned into the API's error shape (413 for size,
 * 400 for the rest) so a rejected upload always says what was wrong.
 */
function acceptFiles(field: string, options: { maxBytes: number; maxFiles: number; what: string }): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: options.maxBytes, files: options.maxFiles, fields: 10, parts: options.maxFiles + 10 },
  }).array(field, options.maxFiles);
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') {
          return next(new HttpError(413, 'file_too_large', `Each ${options.what} may be at most ${MB(options.maxBytes)}. Make it smaller and try again.`, [{ path: field, message: 'Too large.' }]));
        }
        if (err.code === 'LIMIT_FILE_COUNT' || err.code === 'LIMIT_PART_COUNT') {
          return next(new HttpError(400, 'too_many_files', `Send at most ${options.maxFiles} ${options.what}${options.maxFiles > 1 ? 's' : ''} at a time.`, [{ path: field, message: 'Too many files.' }]));
        }
        if (err.code === 'LIMIT_UNEXPECTED_FILE') {
          return next(new HttpError(400, 'unexpected_file_field', `Send the ${options.what} in the form field “${field}”.`, [{ path: err.field ?? field, message: 'Unexpected field.' }]));
        }
        return next(new HttpError(400, 'bad_upload', `The upload could not be read (${err.message}).`));
      }
      // Malformed multipart bodies (busboy) land here too.
      const message = err instanceof Error ? err.message : String(err);
      next(new HttpError(400, 'bad_upload', `The upload could not be read: ${message}. Send the file as multipart/form-data.`));
    });
  };
}

export const acceptPhotos = acceptFiles('photos', { maxBytes: PHOTO_MAX_BYTES, maxFiles: PHOTOS_PER_REQUEST, what: 'photo' });
export const acceptReport = acceptFiles('report', { maxBytes: PDF_MAX_BYTES, maxFiles: 1, what: 'lab report PDF' });

/** The uploaded files, or a 400 when none came. */
export function filesOf(req: { files?: unknown }, what: string): Express.Multer.File[] {
  const files = Array.isArray(req.files) ? (req.files as Express.Multer.File[]) : [];
  if (files.length === 0) throw new HttpError(400, 'no_file', `Choose a ${what} to upload.`);
  for (const f of files) {
    if (f.size === 0) throw new HttpError(400, 'empty_file', `“${f.originalname}” is empty.`);
  }
  return files;
}

/** A photo of the weighbridge ticket, optional when a grower marks a load handed over. */
export const acceptScaleTicket = acceptFiles('ticket', { maxBytes: PHOTO_MAX_BYTES, maxFiles: 1, what: 'scale-ticket photo' });
