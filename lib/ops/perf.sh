#!/usr/bin/env bash
# npm run perf — the benchmarks under perf/, against the production build on a private database.
# They print figures and ratios to their targets; a missed target is reported, not failed.
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"
export RUNGBOOK_TEST_SLOT="${RUNGBOOK_TEST_SLOT:-9}"
# The served build's own request clock (perf/server-clock.mjs): benchmarks read server time from it.
export RUNGBOOK_SERVER_CLOCK="$DATA/server-clock-$RUNGBOOK_TEST_SLOT.tsv"
rm -f "$RUNGBOOK_SERVER_CLOCK"
export SERVER_NODE_OPTIONS="--import $ROOT/perf/server-clock.mjs${SERVER_NODE_OPTIONS:+ $SERVER_NODE_OPTIONS}"
source "$ROOT/lib/ops/serve-test-build.sh"
export BASE_URL="$PUBLIC_URL"

for bench in perf/*.bench.ts; do
  log "benchmark: $bench"
  node_modules/.bin/tsx --conditions=react-server "$bench"
done
