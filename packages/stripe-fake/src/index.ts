export { startStripeFake, type StripeFake, type StripeFakeOptions } from './server';
export type { CardInput, FailNext, StripeFakeControls } from './controls';
export type { PayResult } from './lifecycle';
export type { DeliveryAttempt, DeliveryKind } from './webhooks';
export { TEST_CARDS, type TestCard } from './cards';
export { API_VERSION } from './state';
