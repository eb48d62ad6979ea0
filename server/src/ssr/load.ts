import { existsSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { RequestHandler } from 'express';
import type { SsrHandlers } from '../app';

// A real dynamic import (not turned into require by the CommonJS build): the Angular bundles are ES modules.
const importModule = new Function('specifier', 'return import(specifier)') as (s: string) => Promise<{ reqHandler: RequestHandler }>;

/** Loads both server-rendered apps built by `ng build` from dist/. */
export async function loadSsrHandlers(rootDir: string): Promise<SsrHandlers> {
  const load = async (app: 'admin' | 'portal') => {
    const file = path.join(rootDir, 'dist', app, 'server', 'server.mjs');
    if (!existsSync(file)) throw new Error(`${file} is missing: build the apps first (npm run build).`);
    return (await importModule(pathToFileURL(file).href)).reqHandler;
  };
  const [admin, portal] = await Promise.all([load('admin'), load('portal')]);
  return { admin, portal };
}
