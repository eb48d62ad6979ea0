// Shared by both apps: projects/shared/forms/error-text.ts
export * from '../../../../../shared/forms/error-text';
