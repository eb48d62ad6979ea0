#!/usr/bin/env bash
# `npm run typecheck`: every TypeScript program in the repo, strict, templates included, without emitting.
# The checks are independent, so they run side by side (LB_TYPECHECK_JOBS at a time, 2 by default:
# the CI machine has 2 cores). Each check's output is shown only when it fails.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$LB_ROOT"

# name | command. Slowest first, so the short ones fill the gaps at the end.
CHECKS=(
  "admin app + templates|npx ngc -p projects/admin/tsconfig.app.json --noEmit"
  "server + API bench|npx tsc -p server/tsconfig.json --noEmit"
  "portal app + templates|npx ngc -p projects/portal/tsconfig.app.json --noEmit"
  "admin specs (+ projects/shared)|npx ngc -p projects/admin/tsconfig.spec.json --noEmit"
  "portal specs|npx ngc -p projects/portal/tsconfig.spec.json --noEmit"
  "e2e|npx tsc -p e2e/tsconfig.json --noEmit"
  "packages/contracts|npx tsc -p packages/contracts/tsconfig.json --noEmit"
  "packages/db|npx tsc -p packages/db/tsconfig.json --noEmit"
  "packages/domain|npx tsc -p packages/domain/tsconfig.json --noEmit"
  "packages/stripe-fake|npx tsc -p packages/stripe-fake/tsconfig.json --noEmit"
  "domain bench|npx tsc -p ops/bench/domain/tsconfig.json --noEmit"
)

out="$(mktemp -d)"
trap 'rm -rf "$out"' EXIT
started=$SECONDS

check() { # $1 = index, $2 = name, $3 = command
  local began=$SECONDS
  if bash -c "$3" >"$out/$1.log" 2>&1; then
    echo "ok   $2 ($((SECONDS - began)) s)"
  else
    echo "FAIL $2 ($((SECONDS - began)) s): $3" >"$out/$1.failed"
    echo "FAIL $2 ($((SECONDS - began)) s)"
  fi
}

for i in "${!CHECKS[@]}"; do
  while [ "$(jobs -rp | wc -l)" -ge "${LB_TYPECHECK_JOBS:-2}" ]; do wait -n || true; done
  check "$i" "${CHECKS[$i]%%|*}" "${CHECKS[$i]#*|}" &
done
wait

failed=0
for i in "${!CHECKS[@]}"; do
  if [ -f "$out/$i.failed" ]; then
    failed=1
    echo
    cat "$out/$i.failed"
    cat "$out/$i.log"
  fi
done
echo "type check: $((SECONDS - started)) s"
exit "$failed"
