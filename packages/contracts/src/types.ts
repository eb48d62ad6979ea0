/**
 * The zod-free part of the contract: `@layerbook/contracts/types`. Response types, enums with their
 * labels and field limits — what the apps import. Nothing reachable from here may import zod
 * (checked by `types.spec.ts`), so the browser never downloads it.
 */
export * from './common/lists';
export * from './proposals/proposal-types';
export * from './proposals/proposal-snapshot';
export * from './proposals/portal-views';
export * from './jobs/job';
export * from './samples/sample-types';
export * from './files/photo-types';
export * from './errors/problem';
export * from './common/field-limits';
export * from './common/notice';
export * from './auth/auth-types';
export * from './team/team-types';
export * from './firms/firm-types';
export * from './firms/countries';
export * from './firms/estimating-types';
export * from './inquiries/inquiry-types';
export * from './clients/client-types';
export * from './library/library-types';
export * from './takeoff/takeoff-types';
export * from './takeoff/shape-catalog';
export * from './engine/context';
export * from './proposals/estimate-types';
export * from './billing/billing-settings-types';
export * from './billing/job-billing-types';
export * from './billing/invoice-types';
export * from './billing/change-order-types';
export * from './billing/portal-billing-types';
export * from './payments/payment-types';
export * from './cash/cash-types';
export * from './jobs/sheet-types';
export * from './audit/audit-types';
