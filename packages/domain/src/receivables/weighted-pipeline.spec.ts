import { expectInputError } from '../errors/expect-input-error';
import { weightedPipeline } from './weighted-pipeline';

describe('weighted pipeline (Σ value × stage probability; sales-ops glossaries, common practice)', () => {
  it('DOMAIN.md §2.13 [D]: $65,500 unweighted, $35,200 weighted', () => {
    const p = weightedPipeline([
      { id: 'visit', value: '18000', probability: 0.2 },
      { id: 'sent', value: '9500', probability: 0.4 },
      { id: 'sample', value: '32000', probability: 0.7 },
      { id: 'verbal', value: '6000', probability: 0.9 },
    ]);
    expect(p.unweighted.toFixed(2)).toBe('65500.00');
    expect(p.weighted.toFixed(2)).toBe('35200.00');
  });

  it('refuses a probability over 1', () => {
    expectInputError(() => weightedPipeline([{ id: 'x', value: '1', probability: 1.2 }]), 'opportunities[0].probability');
  });
});
