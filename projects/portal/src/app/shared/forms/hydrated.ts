// Shared by both apps: projects/shared/forms/hydrated.ts
export * from '../../../../../shared/forms/hydrated';
