/**
 * @layerbook/domain — the estimate, schedule, billing and receivables arithmetic.
 * Pure TypeScript: no I/O, no clock, no randomness. Money is Decimal (inputs: decimal strings
 * or Decimal; outputs: Decimal); geometry and quantities are plain numbers.
 */
export { DomainInputError } from './errors/domain-input-error';
export { dottedPath } from './errors/field-path';

// units
export type { LengthUnit } from './units/length';
export { convertArea, convertAreaExact, convertLength, convertLengthExact, isLengthUnit } from './units/length';
export type { Dimension, MassUnit, QuantityUnit, VolumeUnit } from './units/quantity-unit';
export { convertQuantity, convertQuantityExact, dimensionOf, fromBase, isMassUnit, isVolumeUnit, toBase } from './units/quantity-unit';
export type { KitchenVolume } from './units/kitchen-display';
export { formatKitchenVolume, formatMetricMass, formatMetricVolume } from './units/kitchen-display';
export { fixedNumber, plainNumber, roundedNumber } from './units/number-text';
export type { DecimalMark } from './units/typed-length';
export { decimalMarkOf, readTypedLength, readTypedNumber } from './units/typed-length';

// calendar dates
export type { IsoDate } from './calendar/local-date';
export { addDays, daysBetween, fromDayNumber, isoWeekLabel, isoWeekday, mondayOf, toDayNumber, yearBefore } from './calendar/local-date';

// money
export type { MoneyInput } from './money/money';
export { fromMinorUnits, percentShare, roundToCurrency, roundsToZero, sumMoney, toMinorUnits } from './money/money';
export { isKnownCurrency, knownCurrencies, minorUnitDigits } from './money/currency';
export type { ProcessorCurrencyRule } from './money/stripe-amount';
export { fromProcessorAmount, processorCurrencyRule, processorMinimumCharge, toProcessorAmount } from './money/stripe-amount';
export { allocateByWeights, splitEvenly } from './money/allocate';
export { formatMoney } from './money/format-money';

// takeoff geometry
export type { Opening, SurfaceKind, SurfaceMeasure, SurfaceShape, TakeoffSettings } from './geometry/surface-shape';
export { DEFAULT_TAKEOFF_SETTINGS, convertMeasure, measureSurface } from './geometry/measure-surface';
export { convertShape } from './geometry/convert-shape';
export { shoelaceArea } from './geometry/ceilings';
export { roomWallHeight, withCeilingElevation } from './geometry/ceiling-elevation';
export { measureText, totalsText, workingText } from './geometry/measure-text';

// finishes
export type {
  ApplicationMethod,
  Container,
  Coverage,
  Dilution,
  FinishLayer,
  FinishSystem,
  LabourMultipliers,
  MixRecipe,
  Product,
  ProductHazards,
  ProductionRate,
} from './finishes/finish-system';
export { DILUTION_OF_CONCENTRATE_MAX, concentrateShare, splitDilutedMix } from './finishes/dilution';
export type { RecipeShare } from './finishes/mix-recipe';
export { recipeShares } from './finishes/mix-recipe';
export type { LayerQuantity, SurfaceAmount } from './finishes/layer-quantity';
export { WASTE_MAX, layerQuantity } from './finishes/layer-quantity';
export type { ContainerPack, PackLine } from './finishes/container-pack';
export { chooseContainers } from './finishes/container-pack';
export type { BatchLine, PerBaseRecipe } from './finishes/mix-batch';
export { mixBatch, scaleRecipeToBase } from './finishes/mix-batch';
export type { FinishOutline } from './finishes/finish-outline';
export { finishProductIds, layerProductIds, outlineFinish, totalWaitHours } from './finishes/finish-outline';

// labour
export type { CrewTime, LayerHours, MultiplierStep, SurfaceConditions } from './labour/layer-hours';
export { crewTime, layerHours } from './labour/layer-hours';

// schedule
export type { WorkCalendar } from './schedule/work-calendar';
export type {
  JobSchedule,
  Milestone,
  ScheduleDay,
  ScheduleInput,
  ScheduleStep,
  ScheduledTask,
  ScheduleWait,
  WorkChain,
} from './schedule/schedule-job';
export { scheduleJob } from './schedule/schedule-job';
export type { PlanDay, PlannedSchedule, PlanStep, PlanWait } from './schedule/day-plan';
export { planDays } from './schedule/day-plan';
export { hoursText, waitText } from './schedule/hours-text';
export { usFederalHolidays, usFederalHolidaysAhead } from './schedule/us-federal-holidays';

// pricing
export type { Ratio } from './pricing/ratio';
export { marginFromMarkup, markupFromMargin } from './pricing/markup-margin';
export type { OverheadProfitResult, OverheadProfitRule } from './pricing/overhead-profit';
export { applyOverheadProfit } from './pricing/overhead-profit';
export type { RoundingRule } from './pricing/price-rounding';
export { roundPrice } from './pricing/price-rounding';
export type { TaxRule } from './pricing/sales-tax';
export { salesTax } from './pricing/sales-tax';
export type { CostLine, DirectCostInput, Discount, PriceBreakdown, PriceInput } from './pricing/price-job';
export { priceJob } from './pricing/price-job';
export type { PerAreaLine } from './pricing/per-area-check';
export { perAreaCheck, perAreaGap } from './pricing/per-area-check';

// billing
export type { PaymentBasis, PaymentLine, PaymentLineInput, PaymentTrigger } from './billing/payment-schedule';
export { buildPaymentSchedule, paymentLabel } from './billing/payment-schedule';
export type { DepositCapRule, DepositCheck } from './billing/deposit-cap';
export { checkDeposit, depositCap } from './billing/deposit-cap';
export type { ChangeOrder } from './billing/change-orders';
export { contractSumToDate, respreadSchedule, staysOnRespread } from './billing/change-orders';
export type { AcceptedSum, AddOnPrice, ShownPayment } from './billing/accepted-add-ons';
export { acceptedSum } from './billing/accepted-add-ons';
export type { PayApplication, PayApplicationInput, PayApplicationSummary, ValueLine, ValueLineInput } from './billing/pay-application';
export { carryForward, computePayApplication, retainageRateFor } from './billing/pay-application';
export type { IncludedTaxInput } from './billing/invoice-tax';
export { includedTax } from './billing/invoice-tax';
export type { PaymentTerms } from './billing/due-date';
export { NET_DAYS_MAX, dueDate, termsText } from './billing/due-date';
export type { SystemWords } from './billing/invoice-words';
export { paymentLabelWords, termsWords } from './billing/invoice-words';
export { documentNumber } from './billing/document-number';
export type { ReminderCadence, ReminderDue, ReminderStep, RemindersDueInput } from './billing/reminder-steps';
export { reminderSteps, remindersDue } from './billing/reminder-steps';
export type { DepositCreditInput, DepositCreditRule } from './billing/deposit-credit';
export { depositCredit } from './billing/deposit-credit';
export type { LayerCompletion, LayerItem, ValueLineWorkInput } from './billing/layer-progress';
export { layerCompletion, valueLineWork } from './billing/layer-progress';
export type { JobStatement, JobStatementInput, StatementEntry, StatementEntryKind, StatementLine } from './billing/statement';
export { jobStatement } from './billing/statement';
export type { BillingLineRole, BillingScheduleInput, BillingScheduleLine, ScheduleProblem } from './billing/schedule-check';
export { checkBillingSchedule } from './billing/schedule-check';

// receivables
export type { AgedReceivable, AgingBucket, AgingReport, ReceivableInput } from './receivables/aging';
export { AGING_BUCKETS, ageReceivables, bucketDueDates, bucketFor } from './receivables/aging';
export type { Opportunity } from './receivables/weighted-pipeline';
export { weightedPipeline } from './receivables/weighted-pipeline';
export type { CashForecastInput, ExpectedReceipt, ForecastWeek } from './receivables/cash-forecast';
export { cashForecast } from './receivables/cash-forecast';
export type { ClientAging } from './receivables/aging-by-client';
export { agingByClient } from './receivables/aging-by-client';
export type { DatedAmount, ReceivedMonth } from './receivables/cash-received';
export { cashReceivedByMonth, monthsEnding } from './receivables/cash-received';
export type { ForecastStream } from './receivables/cash-forecast';
export type { OddsSource } from './receivables/pipeline-deposits';
export { expectedDeposit, stageOdds } from './receivables/pipeline-deposits';
export type { EstimatedCosts, Margin } from './receivables/job-money';
export { averageJobSize, grossMargin, jobMoney, winRate } from './receivables/job-money';

// safety
export type { Caution, CautionId, JurisdictionKey, SafetyFacts } from './safety/safety-cautions';
export {
  OFFICE_ONLY_LINES,
  crewLeadCaution,
  OUTSIDE_US_LINE,
  STANDING_LINE,
  jurisdictionKeys,
  jurisdictionLine,
  safetyCautions,
  treatedAsTargetHousing,
} from './safety/safety-cautions';
export type { CautionItem, CautionItemKey, CautionLine, CautionWordKey } from './safety/caution-words';
export { CAUTION_ITEM_WORDS, CAUTION_WORDS, cautionLineOf, cautionText } from './safety/caution-words';
export { unpricedScaffoldWarning } from './safety/scaffold-pricing';
export type { FlammableCategory, FlammableClass } from './safety/flammable';
export { FLAMMABLE_FLASH_MAX_C, flammableClass } from './safety/flammable';

// the whole estimate
export type { EstimateInput, EstimateOption, EstimateRoom, EstimateSurface, FirmSettings } from './estimate/estimate-input';
export type { EstimateResult, LayerLine, ProductTotal, SurfaceResult } from './estimate/compute-estimate';
export { computeEstimate, JOB_SIZE_LIMITS } from './estimate/compute-estimate';
export type { LeadNotice, LeadStatus } from './estimate/lead-status';
export {
  ASK_FOR_YEAR,
  TARGET_HOUSING_BEFORE,
  isTreatedAsTargetHousing,
  leadNotice,
  leadRuleYear,
  leadStatus,
} from './estimate/lead-status';
export type { OptionCaution } from './estimate/merge-cautions';
export { mergeCautions } from './estimate/merge-cautions';
export type { EstimateResultJson, Jsonified } from './estimate/result-json';
export { toResultJson } from './estimate/result-json';

// payment schedule totals, sample-board finish words
export type { ScheduleTotals, ScheduledAmount } from './billing/schedule-totals';
export { scheduleTotals } from './billing/schedule-totals';
export type { DescribedLayer } from './samples/finish-steps';
export { clientFinishSteps, crewLayerNote } from './samples/finish-steps';
export type { SiteParts } from './samples/site-line';
export { siteLine } from './samples/site-line';
export type { OverheadProfitEquivalents } from './pricing/overhead-profit-equivalents';
export { overheadProfitEquivalents } from './pricing/overhead-profit-equivalents';
