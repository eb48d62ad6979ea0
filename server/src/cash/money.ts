import type { CashAgingBucket, CashBucketAmounts } from '@layerbook/contracts';
import type Decimal from 'decimal.js';
import { moneyOut } from '../billing/money';
import { AGING_BUCKETS } from './domain';

/** Bucket sums as decimal strings in the firm's currency. */
export function bucketsOut(buckets: Record<CashAgingBucket, Decimal>, currency: string): CashBucketAmounts {
  return Object.fromEntries(AGING_BUCKETS.map((b) => [b, moneyOut(buckets[b], currency)])) as unknown as CashBucketAmounts;
}
