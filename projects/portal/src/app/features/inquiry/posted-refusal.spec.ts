import { describe, expect, it } from 'vitest';
import { readRefusal } from './posted-refusal';

describe('readRefusal', () => {
  it.each([
    ['no context', undefined, null],
    ['a context without a refusal', { other: 1 }, null],
    ['a refusal that is not an object', { inquiryForm: 'nope' }, null],
    [
      'a refusal, keeping only strings',
      {
        inquiryForm: {
          values: { name: 'Ada', consent: true, rooms: 'Hall' },
          errors: [{ field: 'email', message: 'Enter an e-mail address.', extra: 1 }, { field: 3 }, 'x'],
        },
      },
      { values: { name: 'Ada', rooms: 'Hall' }, errors: [{ field: 'email', message: 'Enter an e-mail address.' }] },
    ],
    ['a refusal with nothing usable', { inquiryForm: { values: [], errors: {} } }, { values: {}, errors: [] }],
  ])('reads %s', (_case, context, expected) => {
    expect(readRefusal(context)).toEqual(expected);
  });
});
