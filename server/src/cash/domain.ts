/**
 * The receivables arithmetic the cash page uses. Until @layerbook/domain's index exports the newer
 * functions, they are read from their files; every figure still comes from packages/domain.
 */
export { AGING_BUCKETS, ageReceivables, cashForecast, depositCap, type ReceivableInput } from '@layerbook/domain';
export { agingByClient } from '../../../packages/domain/src/receivables/aging-by-client';
export { cashReceivedByMonth, type DatedAmount } from '../../../packages/domain/src/receivables/cash-received';
export { expectedDeposit, stageOdds } from '../../../packages/domain/src/receivables/pipeline-deposits';
export { averageJobSize, grossMargin, jobMoney, winRate } from '../../../packages/domain/src/receivables/job-money';
