import { describe, expect, it } from 'vitest';
import { LIKELY_WORK_WORDS, stageOddsTip } from './stage-odds';

describe('stage odds words', () => {
  it('puts the odds in a tooltip sentence, not a bare percentage', () => {
    expect(stageOddsTip('Site visit booked', 40)).toBe(
      'Site visit booked: about 40 in 100 inquiries at this stage turn into work (stage odds, set in Settings).',
    );
  });

  it('speaks of likely work, not a weighted pipeline value or a chance', () => {
    const words = Object.values(LIKELY_WORK_WORDS).join(' ');
    expect(words).toContain('Likely work, by stage odds');
    expect(words).not.toMatch(/weighted|pipeline|chance/i);
  });
});
