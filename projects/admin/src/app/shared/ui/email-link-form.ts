// Shared by both apps: projects/shared/ui/email-link-form.ts
export * from '../../../../../shared/ui/email-link-form';
