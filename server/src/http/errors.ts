import { PROBLEM_CONTENT_TYPE } from '@layerbook/contracts';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError } from './problem';

export const apiNotFound: RequestHandler = (_req, _res, next) => {
  next(new HttpError(404, 'Not found', 'No such API route.'));
};

interface BodyParserError {
  type?: string;
  status?: number;
  expose?: boolean;
}

/** The one error middleware: every failure answers application/problem+json, never a stack trace. */
export const problemHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let error: HttpError;
  const parserError = err as BodyParserError;
  if (err instanceof HttpError) {
    error = err;
  } else if (parserError?.type === 'entity.parse.failed') {
    error = new HttpError(400, 'The request body is not valid JSON', 'Send a JSON object.', [
      { field: '(body)', message: 'Not valid JSON.' },
    ]);
  } else if (parserError?.type === 'entity.too.large') {
    error = new HttpError(413, 'The request is too large', 'Send less data.');
  } else if (typeof parserError?.status === 'number' && parserError.status < 500 && parserError.expose) {
    error = new HttpError(parserError.status, 'The request was refused', (err as Error).message);
  } else {
    req.log?.error({ err }, 'unhandled error');
    error = new HttpError(500, 'Something went wrong', 'The error was logged; please try again.');
  }
  if (error.status === 403 && (err as { code?: string }).code === 'EBADCSRFTOKEN') {
    error = new HttpError(403, 'Security check failed', 'Reload the page and try again.');
  }
  res
    .status(error.status)
    .type(PROBLEM_CONTENT_TYPE)
    .send(JSON.stringify(error.toProblem(typeof req.id === 'string' ? req.id : '')));
};

/** A callback's error as an Error (Node-style callbacks type it `any`), for rejecting a promise. */
export function asError(value: unknown): Error {
  return value instanceof Error ? value : new Error(String(value));
}
