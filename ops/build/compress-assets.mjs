// Writes a brotli (.br) and a gzip (.gz) copy beside every compressible file the apps' build made in
// dist/<app>/browser, so the server sends them as they are instead of compressing on every request.
// Files that are already compressed (woff2, images) or too small to gain are left alone.
import { readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';

const COMPRESSIBLE = /\.(?:js|mjs|css|html|json|svg|txt|webmanifest|xml|ico|map)$/;
const MIN_BYTES = 1024;

function* filesUnder(dir) {
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) yield* filesUnder(path);
    else if (COMPRESSIBLE.test(entry.name) && statSync(path).size >= MIN_BYTES) yield path;
  }
}

const totals = { files: 0, raw: 0, br: 0, gz: 0 };
for (const app of process.argv.slice(2)) {
  for (const file of filesUnder(join(app, 'browser'))) {
    const raw = readFileSync(file);
    const br = brotliCompressSync(raw, {
      params: { [constants.BROTLI_PARAM_QUALITY]: constants.BROTLI_MAX_QUALITY, [constants.BROTLI_PARAM_SIZE_HINT]: raw.length },
    });
    const gz = gzipSync(raw, { level: constants.Z_BEST_COMPRESSION });
    writeFileSync(`${file}.br`, br);
    writeFileSync(`${file}.gz`, gz);
    totals.files += 1;
    totals.raw += raw.length;
    totals.br += br.length;
    totals.gz += gz.length;
  }
}
const kB = (n) => `${(n / 1024).toFixed(0)} kB`;
process.stdout.write(`Compressed ${totals.files} files: ${kB(totals.raw)} raw, ${kB(totals.br)} brotli, ${kB(totals.gz)} gzip.\n`);
