import express from 'express';
import request from 'supertest';
import { isDatabaseUnavailable, problemHandler } from '../http/errors';
import { HttpError } from '../http/problem';

// The one error handler answers 503 with Retry-After when the database cannot be reached, and keeps
// its other answers. The codes are PostgreSQL 15's (manual, Appendix A "PostgreSQL Error Codes") and
// Node's socket errors; the messages are node-postgres 8's own.

const withCode = (code: string, message = 'x') => Object.assign(new Error(message), { code });

function appThrowing(error: unknown) {
  const app = express();
  app.get('/boom', () => {
    throw error;
  });
  app.use(problemHandler);
  return app;
}

it.each([
  ['refused (the server is down)', withCode('ECONNREFUSED', 'connect ECONNREFUSED 127.0.0.1:5432')],
  [
    '57P01 admin_shutdown (pg_ctl stop -m fast ended the session)',
    withCode('57P01', 'terminating connection due to administrator command'),
  ],
  ['57P03 cannot_connect_now (starting up or shutting down)', withCode('57P03', 'the database system is shutting down')],
  ['08006 connection_failure', withCode('08006')],
  ['the connection dropped mid-query', new Error('Connection terminated unexpectedly')],
  ['the pool could not connect in time', new Error('timeout exceeded when trying to connect')],
  ['wrapped as a cause (Drizzle)', Object.assign(new Error('Failed query: select 1'), { cause: withCode('57P01') })],
  ['every address refused (AggregateError)', new AggregateError([withCode('ECONNREFUSED'), withCode('ECONNREFUSED')], 'connect failed')],
])('%s: 503 problem+json with Retry-After', async (_what, error) => {
  expect(isDatabaseUnavailable(error)).toBe(true);
  const res = await request(appThrowing(error)).get('/boom');
  expect(res.status).toBe(503);
  expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
  expect(res.headers['retry-after']).toBe('5');
  expect(res.body).toMatchObject({ status: 503, title: 'The database is unavailable' });
  expect(res.body.detail).toContain('Try again in a few seconds');
});

it.each([
  ['a unique violation', withCode('23505', 'duplicate key value violates unique constraint'), 500],
  ['a bug', new TypeError('undefined is not a function'), 500],
  ['an HttpError', new HttpError(409, 'Conflict', 'Already answered.'), 409],
])('%s keeps its answer, without Retry-After', async (_what, error, status) => {
  expect(isDatabaseUnavailable(error)).toBe(false);
  const res = await request(appThrowing(error)).get('/boom');
  expect(res.status).toBe(status);
  expect(res.headers['retry-after']).toBeUndefined();
});
