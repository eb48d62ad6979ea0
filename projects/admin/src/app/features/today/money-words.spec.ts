import { describe, expect, it } from 'vitest';
import today from '../../../i18n/today/en.json';
import { overdueWords, receivedWords } from './money-words';

/** The English words for a today.* key, with its params filled in. */
function english(key: string, params: Readonly<Record<string, unknown>> = {}): string {
  const [, group, name] = key.split('.');
  const text = (today as Record<string, Record<string, string>>)[group][name];
  return text.replace(/\{\{(\w+)\}\}/g, (_, param: string) => String(params[param]));
}

describe('overdueWords', () => {
  it.each([
    ['2026-12-01', '2026-12-02', '1 day overdue'],
    ['2026-11-20', '2026-12-02', '12 days overdue'],
    // across a month end and a leap day: calendar days, never hours
    ['2028-02-28', '2028-03-01', '2 days overdue'],
    ['2026-03-28', '2026-03-30', '2 days overdue'],
    ['2026-12-02', '2026-12-02', null],
    ['2026-12-03', '2026-12-02', null],
    [null, '2026-12-02', null],
    ['2026-12-01', null, null],
  ])('due %s, today %s: %s', (dueOn, today, expected) => {
    const words = overdueWords(dueOn, today);
    expect(words ? english(words.key, words.params) : null).toBe(expected);
  });
});

describe('receivedWords', () => {
  it.each([
    ['2026-12-02', '2026-12-02', 'today'],
    ['2026-12-01', '2026-12-02', 'yesterday'],
    // across a month end: calendar days in the firm's zone, never hours
    ['2026-11-30', '2026-12-01', 'yesterday'],
    ['2026-11-30', '2026-12-02', null],
    ['2026-12-01', null, null],
  ])('received %s, today %s: %s', (receivedOn, today, expected) => {
    expect(receivedWords(receivedOn, today)).toBe(expected);
  });
});
