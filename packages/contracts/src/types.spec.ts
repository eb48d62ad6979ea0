import { buildSync } from 'esbuild';
import path from 'node:path';

/**
 * The apps import `@layerbook/contracts/types` and `/engine`; if anything reachable from them
 * imported zod, the browser would download it (~450 kB). Bundle each entry the way the apps do
 * and list every file it pulls in.
 */
describe('the zod-free entries stay free of zod', () => {
  it.each(['types.ts', 'engine/index.ts'])('%s pulls in no zod', (entry) => {
    const result = buildSync({
      entryPoints: [path.join(__dirname, entry)],
      bundle: true,
      write: false,
      metafile: true,
      platform: 'browser',
      format: 'esm',
      logLevel: 'silent',
    });
    const inputs = Object.keys(result.metafile.inputs);
    expect(inputs.filter((file) => /node_modules[\\/]zod[\\/]/.test(file) || /[\\/]zod\.ts$/.test(file))).toEqual([]);
    expect(inputs.length).toBeGreaterThan(1);
  });
});
