#!/usr/bin/env bash
# npm test — every test, from a fresh machine: typecheck, lint, Vitest (unit + integration over
# real HTTP against MariaDB), Playwright in Debian's Chromium against the production build.
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"

ensure_node_modules
if [ "${SKIP_CHECKS:-0}" != 1 ]; then
  log "typecheck"; node_modules/.bin/tsc --noEmit && node_modules/.bin/tsc --noEmit -p sw/tsconfig.json
  log "lint"; node_modules/.bin/eslint --max-warnings 0 .
fi
source "$ROOT/lib/ops/serve-test-build.sh"

if [ "${TEST_ONLY_VITEST:-}" != "-" ]; then
  log "vitest (unit and integration)"
  # shellcheck disable=SC2086
  node_modules/.bin/vitest run ${TEST_ONLY_VITEST:-}
fi
if [ "${TEST_ONLY_PLAYWRIGHT:-}" != "-" ]; then
  log "playwright (Debian's chromium)"
  # shellcheck disable=SC2086
  node_modules/.bin/playwright test ${TEST_ONLY_PLAYWRIGHT:-}
fi
