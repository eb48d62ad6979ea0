import { describe, expect, it } from 'vitest';
import inquiries from '../../../i18n/inquiries/en.json';
import { LIKELY_WORK_WORDS } from './stage-odds';

describe('stage odds words', () => {
  it('puts the odds in a tooltip sentence, not a bare percentage', () => {
    expect(inquiries.board.oddsTip).toBe(
      '{{stage}}: about {{percent}} in 100 inquiries at this stage turn into work (stage odds, set in Settings).',
    );
  });

  it('speaks of likely work, not a weighted pipeline value or a chance', () => {
    const words = [...Object.values(LIKELY_WORK_WORDS), inquiries.board.oddsTip].join(' ');
    expect(words).toContain('Likely work, by stage odds');
    expect(words).not.toMatch(/weighted|pipeline|chance/i);
  });
});
