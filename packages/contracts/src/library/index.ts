// The zod schemas only: enums, labels, limits and answers come through ../types.ts. Generic
// names (lengthUnit, numberField) stay internal so they cannot clash with another area's.
export * from './product';
export * from './finish-system';
