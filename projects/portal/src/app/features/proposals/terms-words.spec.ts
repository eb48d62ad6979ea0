import { describe, expect, it } from 'vitest';
import { paymentTermsSentence } from './terms-words';

describe('paymentTermsSentence', () => {
  it.each([
    [
      30,
      40,
      'A deposit of 30 % on acceptance, a progress payment of 40 % when the layer named in the payment schedule is finished on every surface, and the rest on completion, as in the payment schedule of each option.',
    ],
    [30, 0, 'A deposit of 30 % on acceptance and the rest on completion, as in the payment schedule of each option.'],
    [
      0,
      50,
      'A progress payment of 50 % when the layer named in the payment schedule is finished on every surface and the rest on completion, as in the payment schedule of each option.',
    ],
    [0, 0, 'Payment in full on completion, as in the payment schedule of each option.'],
  ])('deposit %d %, progress %d %: no stray comma, only the payments there are', (depositPercent, progressPercent, sentence) => {
    const text = paymentTermsSentence({ depositPercent, progressPercent });
    expect(text).toBe(sentence);
    expect(text).not.toMatch(/\s,/);
  });
});
