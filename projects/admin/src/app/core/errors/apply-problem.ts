// Shared by both apps: projects/shared/errors/apply-problem.ts
export * from '../../../../../shared/errors/apply-problem';
