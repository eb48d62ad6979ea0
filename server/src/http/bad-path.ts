import type { RequestHandler } from 'express';
import { HttpError } from './problem';

/**
 * A path whose percent-encoding does not decode (`/clients/%E0%A4%A`) is the client's mistake:
 * answer 400 before a router or the server-side renderer trips over it with a 500.
 */
export const refuseUndecodablePath: RequestHandler = (req, _res, next) => {
  try {
    decodeURIComponent(req.path);
  } catch {
    return next(
      new HttpError(400, 'The address is not valid', 'Check the link: part of it is not valid URL encoding.', [
        { field: '(path)', message: 'Not valid percent-encoding.' },
      ]),
    );
  }
  next();
};
