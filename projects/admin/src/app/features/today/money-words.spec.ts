import { describe, expect, it } from 'vitest';
import { overdueWords, receivedWords } from './money-words';

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
    expect(overdueWords(dueOn, today)).toBe(expected);
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
