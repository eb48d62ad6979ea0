// Shared by both apps: projects/shared/forms/text-validators.ts
export * from '../../../../../shared/forms/text-validators';
