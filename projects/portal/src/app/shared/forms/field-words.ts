// Shared by both apps: projects/shared/forms/field-words.ts
export * from '../../../../../shared/forms/field-words';
