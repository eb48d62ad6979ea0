import billing from '../../../i18n/billing/en.json';
import { wordsAt } from '../../testing/words';
import type { PortalChangeOrder } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { contractChangeWords } from './change-order-words';

const say = (key: string, params?: Readonly<Record<string, unknown>>) => wordsAt({ billing }, `billing.${key}`, params);

const co = (over: Partial<PortalChangeOrder>) =>
  ({ amount: '1082.50', currency: 'USD', contractSumBefore: '10000.00', contractSumAfter: '11082.50', status: 'sent', ...over }) as const;

describe('contractChangeWords', () => {
  it.each([
    [co({}), 'Your contract sum goes from $10,000.00 to $11,082.50 once you approve (up $1,082.50, tax included).'],
    [
      co({ amount: '-216.55', contractSumAfter: '9783.45', status: 'approved' }),
      'Your contract sum went from $10,000.00 to $9,783.45 (down $216.55, tax included).',
    ],
    [co({ status: 'declined' }), 'Your contract sum would have gone from $10,000.00 to $11,082.50 (up $1,082.50, tax included).'],
    // a lump sum the firm's tax mode leaves untaxed: its note says why, so no "tax included" here
    [co({ taxNote: 'noTax' }), 'Your contract sum goes from $10,000.00 to $11,082.50 once you approve (up $1,082.50).'],
  ])('says the change before and after: %#', (input, words) => {
    expect(contractChangeWords(input, 'en-US', say)).toBe(words);
  });

  it('formats in the reader’s locale with the currency’s own minor units', () => {
    expect(
      contractChangeWords(co({ amount: '1500', currency: 'JPY', contractSumBefore: '100000', contractSumAfter: '101500' }), 'en-US', say),
    ).toBe('Your contract sum goes from ¥100,000 to ¥101,500 once you approve (up ¥1,500, tax included).');
  });
});
