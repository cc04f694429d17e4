#!/usr/bin/env bash
# `npm test`: the same set-up as `npm start` (plus Debian's chromium for the browser tests),
# then every test, unit to browser, against a fresh test database. `npm test -- --only=unit`
# (or integration, e2e) runs one layer.
source "$(dirname "$0")/setup.sh"
ensure_debian_packages ca-certificates chromium fonts-dejavu-core
ensure_node_modules
RIBBONRY_OWN_PG=1 pg_start
set +e
node "$ROOT/node_modules/tsx/dist/cli.mjs" "$ROOT/scripts/run.ts" test "$@"
code=$?
exit $code
