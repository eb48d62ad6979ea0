// Shared by both apps: projects/shared/ui/auth-frame.ts
export * from '../../../../../shared/ui/auth-frame';
