import { SCAFFOLD_PRICING_NOTE } from '../safety/safety-cautions';
import { mergeCautions, type OptionCaution } from './merge-cautions';

// Merging is presentation, not a rule: common practice, no source. The wording merged is the engine's own.
const lime = (names: string): OptionCaution => ({
  id: 'lime-alkali',
  title: 'Lime is caustic',
  rule: 'ICSC 0408 (calcium hydroxide)',
  standing: 's',
  bullets: [`Lime products: ${names}.`, 'Keep eyewash on site; flush eyes or skin with water for at least 15 minutes.'],
});

describe('mergeCautions: one document, each caution and each line once', () => {
  it.each([
    ['the same lime in both options', [[lime('Lime putty')], [lime('Lime putty')]], 'Lime products: Lime putty.'],
    ['another lime in option B', [[lime('Lime putty')], [lime('Marmorino')]], 'Lime products: Lime putty, Marmorino.'],
    [
      'overlapping lists',
      [[lime('Lime putty, Marmorino')], [lime('Marmorino, Limewash')]],
      'Lime products: Lime putty, Marmorino, Limewash.',
    ],
  ])('%s gives one "Lime products" line', (_, perOption, line) => {
    const [merged, ...others] = mergeCautions(perOption);
    expect(others).toEqual([]);
    expect(merged.bullets).toEqual([line, 'Keep eyewash on site; flush eyes or skin with water for at least 15 minutes.']);
    expect(merged.bullets.filter((b) => b.startsWith('Lime products'))).toHaveLength(1);
  });

  it('keeps each caution’s jurisdiction line, and leaves it out where an older result had none', () => {
    const said = { ...lime('Lime putty'), jurisdiction: 'Guidance, not a regulation.' };
    expect(mergeCautions([[said], [lime('Marmorino')]])[0].jurisdiction).toBe('Guidance, not a regulation.');
    expect(mergeCautions([[lime('Lime putty')]])[0]).not.toHaveProperty('jurisdiction');
  });

  it('keeps cautions in first-seen order and sentences that are not lists as they are', () => {
    const height: OptionCaution = {
      id: 'height',
      title: 'Work at height',
      rule: 'r',
      standing: 's',
      bullets: ['Use a guardrail: always.'],
    };
    const merged = mergeCautions([[height], [lime('Lime putty'), { ...height, bullets: ['Use a guardrail: always.', 'Check the base.'] }]]);
    expect(merged.map((c) => c.id)).toEqual(['height', 'lime-alkali']);
    expect(merged[0].bullets).toEqual(['Use a guardrail: always.', 'Check the base.']);
  });

  it('leaves the estimator’s pricing reminder out of what the client reads, and keeps it for the office', () => {
    const scaffold: OptionCaution = {
      id: 'scaffold-fall-protection',
      title: 'Scaffold fall protection',
      rule: '29 CFR 1926.451(g)(1)',
      standing: 's',
      bullets: ['Work on a scaffold more than 10 ft above a lower level needs guardrails.', SCAFFOLD_PRICING_NOTE],
    };
    expect(mergeCautions([[scaffold]], 'client')[0].bullets).toEqual([
      'Work on a scaffold more than 10 ft above a lower level needs guardrails.',
    ]);
    expect(mergeCautions([[scaffold]])[0].bullets).toContain(SCAFFOLD_PRICING_NOTE);
  });
});
