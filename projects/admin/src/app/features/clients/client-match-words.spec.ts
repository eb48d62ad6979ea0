import { describe, expect, it } from 'vitest';
import { matchLabel, matchWords } from './client-match-words';

describe('client match words', () => {
  it.each([
    [['email'], 'same e-mail'],
    [['phone', 'name'], 'same phone and name'],
    [['email', 'phone', 'name'], 'same e-mail, phone and name'],
  ] as const)('says why %j may be the same person', (matchedOn, words) => {
    expect(matchWords({ matchedOn })).toBe(words);
  });

  it('tells apart clients of the same name by e-mail, else phone', () => {
    expect(matchLabel({ name: 'Ida Marsh', email: 'ida@example.com', phone: '555' })).toBe('Ida Marsh (ida@example.com)');
    expect(matchLabel({ name: 'Ida Marsh', email: '', phone: '555-0100' })).toBe('Ida Marsh (555-0100)');
    expect(matchLabel({ name: 'Ida Marsh', email: '', phone: '' })).toBe('Ida Marsh');
  });
});
