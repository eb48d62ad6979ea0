#!/usr/bin/env bash
# Builds both server-rendered apps into dist/ (skipped when nothing changed since the last build)
# and bundles the server with esbuild into server/dist/.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$LB_ROOT"
# Each app's words, merged per language for the build (projects/*/src/i18n, projects/shared/i18n/words).
node ops/i18n/merge.mjs
# The icon font cut to the icons the apps use (projects/shared-styles/fonts; unchanged unless the icons are).
node ops/build/subset-icons.mjs
stale() { # $1 = built file; stale when missing or older than any source it is built from
  [ ! -f "$1" ] && return 0
  [ -n "$(find projects packages/contracts packages/domain angular.json package-lock.json -newer "$1" -type f -print -quit 2>/dev/null)" ]
}
if stale dist/admin/server/server.mjs || stale dist/portal/server/server.mjs || [ "${1:-}" = "--force" ]; then
  echo "Building the admin and portal apps…"
  # One initial script per app instead of a dozen small ones: Angular preloads at most 10 of an app's
  # initial chunks, so the rest (the framework's largest, as it happened) came a round trip later.
  # Chunks are merged after esbuild (Angular's chunk optimizer; the initial JS is also ~3 kB smaller).
  export NG_BUILD_OPTIMIZE_CHUNKS=1
  npx ng build admin >/tmp/layerbook-build-admin.log 2>&1 || { cat /tmp/layerbook-build-admin.log; exit 1; }
  npx ng build portal >/tmp/layerbook-build-portal.log 2>&1 || { cat /tmp/layerbook-build-portal.log; exit 1; }
  # Brotli and gzip copies of the static files, served as they are (projects/shared/ssr/ssr-app.ts).
  node ops/build/compress-assets.mjs dist/admin dist/portal
  touch dist/admin/server/server.mjs dist/portal/server/server.mjs
fi
# npm packages stay external (argon2 is native); our own workspace packages are TypeScript, so they are bundled.
externals=$(node -e "const p=require('./package.json');console.log(Object.keys({...p.dependencies,...p.devDependencies}).map(n=>'--external:'+n).join(' '))")
# shellcheck disable=SC2086
npx esbuild server/src/main.ts server/src/seed/run.ts server/src/queue/cli.ts server/src/files/s3-fake-cli.ts --bundle --platform=node --target=node20 --format=cjs \
  $externals --outdir=server/dist --log-level=warning
# The local Stripe stand-in's process (npm start and the e2e setup run it by PID).
# shellcheck disable=SC2086
npx esbuild packages/stripe-fake/src/cli.ts --bundle --platform=node --target=node20 --format=cjs \
  $externals --outfile=packages/stripe-fake/dist/cli.js --log-level=warning
