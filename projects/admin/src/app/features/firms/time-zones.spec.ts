import { describe, expect, it } from 'vitest';
import { timeZoneChoices } from './time-zones';

describe('timeZoneChoices', () => {
  it.each([
    ['a known zone', 'America/New_York', false],
    ['no zone yet', '', false],
    ['a zone this runtime does not list', 'Mars/Olympus_Mons', true],
  ])('with %s', (_case, current, isAddedFirst) => {
    const choices = timeZoneChoices(current);
    expect(choices).toEqual(expect.arrayContaining(['Europe/London']));
    expect(choices[0] === current).toBe(isAddedFirst);
  });
});
