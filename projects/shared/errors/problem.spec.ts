import { HttpErrorResponse } from '@angular/common/http';
import { describe, expect, it } from 'vitest';
import { problemMessage, toProblem } from './problem';

const httpError = (status: number, error: unknown = null) => new HttpErrorResponse({ status, error, url: '/api/x' });

describe('toProblem', () => {
  it('keeps the API problem as it came', () => {
    const body = {
      type: 'about:blank',
      title: 'Check the highlighted fields.',
      status: 400,
      errors: [{ field: 'email', message: 'Enter an e-mail address.' }],
    };
    expect(toProblem(httpError(400, body))).toEqual(body);
  });

  it.each([
    // status, title shown when the body is not a problem (our own words, no source)
    [0, 'Layerbook could not be reached. Check your connection and try again.'],
    [401, 'Please sign in again.'],
    [403, 'Your role does not allow this.'],
    [404, 'We could not find that.'],
    [429, 'Too many tries. Wait a minute and try again.'],
    [500, 'Something went wrong on our side. Please try again.'],
    [503, 'Something went wrong on our side. Please try again.'],
    [418, 'Something went wrong. Please try again.'],
  ])('answers %d without a problem body with words', (status, title) => {
    expect(toProblem(httpError(status, '<html>proxy page</html>'))).toEqual({
      type: 'about:blank',
      title,
      status,
    });
  });

  it.each([
    ['field errors that are not a list', { title: 'x', status: 400, errors: 'email' }],
    ['a field error without a message', { title: 'x', status: 400, errors: [{ field: 'email' }] }],
    ['a status that is not a number', { title: 'x', status: '400' }],
  ])('does not trust a body with %s', (_what, body) => {
    expect(toProblem(httpError(400, body)).title).toBe('Something went wrong. Please try again.');
  });

  it('turns anything else thrown into a generic problem', () => {
    expect(toProblem(new Error('boom'))).toEqual({
      type: 'about:blank',
      title: 'Something went wrong. Please try again.',
      status: 0,
    });
  });
});

describe('problemMessage', () => {
  it.each([
    [
      'the detail when there is one',
      { title: 'Conflict', status: 409, detail: 'The estimate was sent meanwhile.' },
      'The estimate was sent meanwhile.',
    ],
    ['the title otherwise', { title: 'Not found', status: 404 }, 'Not found'],
  ])('says %s', (_what, body, words) => {
    expect(problemMessage(httpError(body.status, { type: 'about:blank', ...body }))).toBe(words);
  });

  it('says something even for an unreachable API', () => {
    expect(problemMessage(httpError(0))).toBe('Layerbook could not be reached. Check your connection and try again.');
  });
});
