/**
 * Zod-free helpers the browser may import: `@layerbook/contracts/engine`. The types they take
 * (EstimateContext, EngineRoom) come with the other answers from `@layerbook/contracts/types`.
 */
export * from './settings';
export * from './assemble';
export { paymentLabel } from '@layerbook/domain';
// Billing in the browser: a progress line's work to date as % or amount, money compared or added exactly, days overdue.
export { DomainInputError, daysBetween, minorUnitDigits, roundToCurrency, roundsToZero, sumMoney, valueLineWork } from '@layerbook/domain';
// The crew's mix card: a layer's recipe scaled to the batch the crew types, in kitchen measures and metric.
export {
  convertArea,
  convertLength,
  convertQuantity,
  dimensionOf,
  formatKitchenVolume,
  formatMetricMass,
  formatMetricVolume,
  fromBase,
  mixBatch,
  toBase,
} from '@layerbook/domain';
