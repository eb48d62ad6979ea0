export * from './errors/problem';
export * from './auth/roles';
export * from './auth/fields';
export * from './auth/auth';
export * from './firms/firm';
export * from './team/team';
