import type { Problem } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { afterSaveAnswer, isSavedByOther } from './save-answer';

describe('afterSaveAnswer', () => {
  it.each([
    ['nothing typed while saving', '{"a":1}', '{"a":1}', 'refill'],
    ['a field typed while saving', '{"a":1}', '{"a":2}', 'keepTyped'],
  ] as const)('%s → %s', (_case, sent, now, expected) => {
    expect(afterSaveAnswer(sent, now)).toBe(expected);
  });
});

describe('isSavedByOther', () => {
  const problem = (status: number, field?: string): Problem => ({
    type: 'about:blank',
    title: 't',
    status,
    ...(field ? { errors: [{ field, message: 'm' }] } : {}),
  });
  it.each([
    [problem(409, 'computedAt'), true],
    [problem(409, 'estimateId'), false],
    [problem(409), false],
    [problem(400, 'computedAt'), false],
  ])('%o → %s', (p, expected) => {
    expect(isSavedByOther(p)).toBe(expected);
  });
});
