export * from './portal-decisions';
export * from './portal-views';
export * from './job';
