import { join } from 'node:path';
import { createSsrApp, ssrRequestHandler } from '../../shared/ssr/ssr-app';

const app = createSsrApp({
  browserDistFolder: join(import.meta.dirname, '../browser'),
  mediaRoot: '/portal/media/',
  // Set by the host when a no-script inquiry post is refused: the page shows it again with the
  // prospect's words and messages (features/inquiry/posted-refusal.ts reads it).
  requestContext: (res) => ({ inquiryForm: res.locals['inquiryForm'] }),
  // A refused post answers 400 even if rendering itself went well (a 404 or 5xx stays as it is).
  statusFor: (rendered, res) => (res.locals['inquiryForm'] !== undefined && rendered < 300 ? 400 : rendered),
});

/** Mounted by the Layerbook host server (and used by the Angular CLI dev server). */
export const reqHandler = ssrRequestHandler(app, import.meta.url);
