#!/usr/bin/env bash
# `npm run bench`: the same set-up as `npm test`, then the benchmarks; they print figures.
source "$(dirname "$0")/setup.sh"
ensure_debian_packages ca-certificates
ensure_node_modules
RIBBONRY_OWN_PG=1 pg_start
node "$ROOT/node_modules/tsx/dist/cli.mjs" "$ROOT/scripts/bench/index.ts" "$@"
