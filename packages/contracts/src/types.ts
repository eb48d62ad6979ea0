/**
 * The zod-free part of the contract: `@layerbook/contracts/types`. Response types, enums with their
 * labels and field limits — what the apps import. Nothing reachable from here may import zod
 * (checked by `types.spec.ts`), so the browser never downloads it.
 */
export * from './common/lists';
