import type { RequestHandler } from 'express';
import multer from 'multer';
import type { Config } from '../config';
import { HttpError } from '../http/problem';

/** Caption and the like; anything longer than this in a form field is not a caption. */
const MAX_FIELD_BYTES = 2_000;

const megabytes = (bytes: number) => `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB`;

/**
 * Receives one file in `field` (plus a few short text fields) into memory, within limits, and turns
 * multer's errors into problem+json naming the field. One file per request on purpose: the app
 * sends each photo on its own, so each has its own progress bar and its own error.
 */
export function receiveOneFile(config: Config, field: string): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    // Browsers send UTF-8 names; busboy would otherwise read them as Latin-1.
    defParamCharset: 'utf8',
    limits: { fileSize: config.FILE_MAX_BYTES, files: 1, fields: 5, fieldSize: MAX_FIELD_BYTES, parts: 6 },
  }).single(field);
  return (req, res, next) => {
    upload(req, res, (error: unknown) => next(error ? uploadProblem(error, field, config.FILE_MAX_BYTES) : undefined));
  };
}

function uploadProblem(error: unknown, field: string, maxBytes: number): HttpError {
  if (error instanceof multer.MulterError) {
    switch (error.code) {
      case 'LIMIT_FILE_SIZE': {
        const message = `The file is larger than ${megabytes(maxBytes)}. Upload a smaller photo.`;
        return new HttpError(413, 'The file is too large', message, [{ field, message }]);
      }
      case 'LIMIT_FILE_COUNT':
      case 'LIMIT_UNEXPECTED_FILE': {
        const message = `Send one file, in the field "${field}".`;
        return new HttpError(400, 'The request has invalid fields', message, [
          { field: error.field && error.field !== field ? error.field : field, message },
        ]);
      }
      case 'LIMIT_FIELD_VALUE': {
        const message = 'This text is too long.';
        return new HttpError(400, 'The request has invalid fields', message, [{ field: error.field ?? '(body)', message }]);
      }
      default:
        return new HttpError(400, 'The request has invalid fields', 'The form has too many parts.', [
          { field: '(body)', message: 'The form has too many parts.' },
        ]);
    }
  }
  // busboy's own errors: a cut-off or malformed multipart body.
  const message = 'The upload was cut short or is not valid form data. Try again.';
  return new HttpError(400, 'The upload could not be read', message, [{ field, message }]);
}
