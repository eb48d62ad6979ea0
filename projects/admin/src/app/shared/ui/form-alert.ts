// Shared by both apps: projects/shared/ui/form-alert.ts
export * from '../../../../../shared/ui/form-alert';
