/** The receivables arithmetic the cash page uses: every figure comes from packages/domain. */
export {
  AGING_BUCKETS,
  ageReceivables,
  agingByClient,
  averageJobSize,
  bucketDueDates,
  cashForecast,
  cashReceivedByMonth,
  depositCap,
  expectedDeposit,
  grossMargin,
  jobMoney,
  stageOdds,
  winRate,
  type DatedAmount,
  type ReceivableInput,
} from '@layerbook/domain';
