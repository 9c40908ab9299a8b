import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { HttpError, ValidationError } from '../../errors';

// Multipart uploads held in memory (limits keep that small); multer's own errors become our error shape.

/**
 * Reads one file field, but only after `authorize` has passed: a stranger's upload is refused before a byte of
 * it is held in memory. Anything busboy cannot parse (a part cut short, a header that is not one) is a 400.
 */
export function singleFile(field: string, maxBytes: number, authorize: (req: Request) => Promise<unknown>): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 10, parts: 12 } }).single(field);
  return (req, res, next) => {
    authorize(req).then(
      () =>
        upload(req, res, (err: unknown) => {
          if (!err) return next();
          if (err instanceof multer.MulterError) {
            if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError('payload_too_large', `The file is larger than ${Math.round(maxBytes / 1024 / 1024)} MB`, { [field]: 'too large' }));
            return next(new ValidationError({ [field]: err.message }, 'The upload could not be read'));
          }
          if (err instanceof HttpError) return next(err);
          next(new ValidationError({ [field]: 'The upload is not a well-formed multipart form' }, 'The upload could not be read'));
        }),
      next,
    );
  };
}

/** The uploaded file's text, or a 400 naming the field when none was sent. */
export function uploadedText(file: Express.Multer.File | undefined, field = 'file'): string {
  if (!file) throw new ValidationError({ [field]: 'Choose a CSV file to upload' });
  return file.buffer.toString('utf8');
}
