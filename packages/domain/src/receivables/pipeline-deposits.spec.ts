import { expectInputError } from '../errors/expect-input-error';
import { expectedDeposit, stageOdds } from './pipeline-deposits';

describe('pipeline deposits', () => {
  it('uses the firm’s own odds where set, else the default (common practice, no source)', () => {
    const odds = stageOdds(['new', 'samples'] as const, new Map([['samples', 70]]), { new: 10, samples: 50 });
    expect(odds).toEqual([
      { stage: 'new', percent: 10, source: 'default' },
      { stage: 'samples', percent: 70, source: 'firm' },
    ]);
    expectInputError(() => stageOdds(['new'] as const, new Map([['new', 120]]), { new: 10 }), 'odds.new');
  });

  it('is the value × deposit share, within the deposit limit', () => {
    expect(expectedDeposit('20000.00', '0.25', { kind: 'none' }, 'USD').toFixed(2)).toBe('5000.00');
    // California Bus. & Prof. Code §7159: a home improvement deposit is at most the lesser of $1,000 or 10 % of the contract price
    expect(expectedDeposit('20000.00', '0.25', { kind: 'lesserOf', amount: '1000', share: 0.1 }, 'USD').toFixed(2)).toBe('1000.00');
    expect(expectedDeposit('3333.33', '0.1', { kind: 'none' }, 'USD').toFixed(2)).toBe('333.33');
    expectInputError(() => expectedDeposit('-1', '0.1', { kind: 'none' }, 'USD'), 'value');
    expectInputError(() => expectedDeposit('1', '1.5', { kind: 'none' }, 'USD'), 'share');
  });
});
