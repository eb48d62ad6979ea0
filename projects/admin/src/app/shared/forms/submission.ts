// Shared by both apps: projects/shared/forms/submission.ts
export * from '../../../../../shared/forms/submission';
