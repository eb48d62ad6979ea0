import { join } from 'node:path';
import { createSsrApp, ssrRequestHandler } from '../../shared/ssr/ssr-app';

const app = createSsrApp({
  browserDistFolder: join(import.meta.dirname, '../browser'),
  mediaRoot: '/media/',
});

/** Mounted by the Layerbook host server (and used by the Angular CLI dev server). */
export const reqHandler = ssrRequestHandler(app, import.meta.url);
