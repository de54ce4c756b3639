#!/usr/bin/env bash
# npm run perf — the benchmarks under perf/, against the production build on a private database.
# They print figures and ratios to their targets; a missed target is reported, not failed.
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"
export RUNGBOOK_TEST_SLOT="${RUNGBOOK_TEST_SLOT:-9}"
source "$ROOT/lib/ops/serve-test-build.sh"
export BASE_URL="$PUBLIC_URL"

for bench in perf/*.bench.ts; do
  log "benchmark: $bench"
  node_modules/.bin/tsx --conditions=react-server "$bench"
done
