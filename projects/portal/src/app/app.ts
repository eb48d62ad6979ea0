// Shared by both apps: projects/shared/app/root.ts
export { App } from '../../../shared/app/root';
