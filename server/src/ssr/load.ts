import { existsSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { RequestHandler } from 'express';
import type { SsrHandlers } from '../app';
import { withApiDispatch } from './api-dispatch';

/** What each app's server.mjs exports for us. */
interface SsrModule {
  reqHandler: RequestHandler;
}

/** Loads both server-rendered apps built by `ng build` from dist/. */
export async function loadSsrHandlers(rootDir: string): Promise<SsrHandlers> {
  const load = async (app: 'admin' | 'portal') => {
    const file = path.join(rootDir, 'dist', app, 'server', 'server.mjs');
    if (!existsSync(file)) throw new Error(`${file} is missing: build the apps first (npm run build).`);
    // A real dynamic import (the Angular bundles are ES modules): node16 module resolution and esbuild's
    // CommonJS output both keep `import()` as it is for a path known only at run time.
    // Each render reaches the API in-process (api-dispatch.ts), not over loopback HTTP.
    return withApiDispatch(((await import(pathToFileURL(file).href)) as SsrModule).reqHandler);
  };
  const [admin, portal] = await Promise.all([load('admin'), load('portal')]);
  return { admin, portal };
}
