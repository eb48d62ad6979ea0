// Shared by both apps: projects/shared/ui/wordmark.ts
export * from '../../../../../shared/ui/wordmark';
