export * from './firms';
export * from './team';
export * from './auth';
export * from './clients';
export * from './inquiries';
export * from './audit';
export * from './mail';
