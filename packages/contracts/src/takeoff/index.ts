// The zod schemas only: the shape catalogue, limits and answers come through ../types.ts.
export * from './shape';
export * from './takeoff';
