// Shared by both apps: projects/shared/ui/not-found.ts
export * from '../../../../../shared/ui/not-found';
