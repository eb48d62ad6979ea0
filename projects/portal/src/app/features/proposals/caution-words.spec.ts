import { describe, expect, it } from 'vitest';
import { cautionFootnotes } from './caution-words';

describe('cautionFootnotes', () => {
  it.each([
    [
      'a caution of a firm outside the US',
      { rule: '40 CFR 745 subpart E', jurisdiction: 'A US federal rule. Outside the US, check your national or provincial rules.' },
      ['40 CFR 745 subpart E', 'A US federal rule. Outside the US, check your national or provincial rules.'],
    ],
    ['guidance', { rule: 'ICSC 0408', jurisdiction: 'Guidance, not a regulation.' }, ['ICSC 0408', 'Guidance, not a regulation.']],
    ['a snapshot from before the jurisdiction line', { rule: '29 CFR 1926.451(g)(1)' }, ['29 CFR 1926.451(g)(1)']],
    ['nothing to say', { rule: ' ', jurisdiction: '' }, []],
  ])('%s', (_case, caution, lines) => {
    expect(cautionFootnotes(caution)).toEqual(lines);
  });
});
