#!/usr/bin/env bash
# `npm start`: set everything up on this machine (Debian packages, node modules, PostgreSQL),
# then migrate, start the local fakes, seed the demo show when empty, build and serve.
# `npm run dev` does the same with `next dev` instead of a production build.
source "$(dirname "$0")/setup.sh"
ensure_debian_packages ca-certificates
ensure_node_modules
pg_start
trap 'true' INT TERM   # let the supervisor handle Ctrl-C, then stop PostgreSQL below
if [ "${1:-}" = "--dev" ]; then mode=dev; else mode=start; fi
set +e
node "$ROOT/node_modules/tsx/dist/cli.mjs" "$ROOT/scripts/run.ts" "$mode"
code=$?
if [ "${RIBBONRY_KEEP_PG:-}" != "1" ] && [ -n "${RIBBONRY_PG_DATA:-}" ]; then pg_stop; log "PostgreSQL stopped"; fi
exit $code
