// Shared by both apps: projects/shared/errors/problem.ts
export * from '../../../../../shared/errors/problem';
