import { hoursText, waitText } from './hours-text';

describe('hours in words (common practice, no source)', () => {
  it.each([
    [6.5, '6.5 h'],
    [2.3333, '2.33 h'],
    [1204, '1,204 h'],
    [0, '0 h'],
  ])('hoursText(%d) is %s', (hours, text) => expect(hoursText(hours)).toBe(text));

  // DOMAIN.md §2.7 names the usual waits: set, recoat, overnight (16 h), a day, a short cure (72 h).
  it.each([
    [0, 'no wait'],
    [4, '4 h'],
    [16, '16 h'],
    [47.5, '47.5 h'],
    [48, '48 h (2 days)'],
    [72, '72 h (3 days)'],
    [100, '100 h (4 days 4 h)'],
    [2160, '2,160 h (90 days)'],
  ])('waitText(%d) is %s', (hours, text) => expect(waitText(hours)).toBe(text));
});
