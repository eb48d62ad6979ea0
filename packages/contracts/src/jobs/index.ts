export * from './job';
export * from './job-status';
