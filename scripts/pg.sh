#!/usr/bin/env bash
# Start or stop the project's own PostgreSQL by hand: `bash scripts/pg.sh start|stop|status`.
source "$(dirname "$0")/setup.sh"
case "${1:-start}" in
  start) RIBBONRY_OWN_PG=1 pg_start; pg_ensure_database ribbonry; log "postgres://postgres@127.0.0.1:$PG_PORT/ribbonry" ;;
  stop) pg_stop; log "PostgreSQL stopped" ;;
  status) pg_run "$(pg_bindir)/pg_ctl" -D "$(pg_datadir)" status ;;
  *) echo "usage: scripts/pg.sh start|stop|status"; exit 2 ;;
esac
