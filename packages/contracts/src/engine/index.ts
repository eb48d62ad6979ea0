/**
 * Zod-free helpers the browser may import: `@layerbook/contracts/engine`. The types they take
 * (EstimateContext, EngineRoom) come with the other answers from `@layerbook/contracts/types`.
 */
export * from './settings';
export * from './assemble';
export { paymentLabel } from '@layerbook/domain';
