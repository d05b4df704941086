#!/usr/bin/env bash
# Stops only Roostline's own MariaDB, found by its pid file.
source "$(dirname "$0")/common.sh"
if ! pid_alive "$DB_PID"; then
  log "MariaDB is not running"
  exit 0
fi
pid="$(cat "$DB_PID")"
kill -TERM "$pid"
for _ in $(seq 1 100); do
  pid_alive "$DB_PID" || { log "MariaDB stopped"; exit 0; }
  sleep 0.1
done
die "MariaDB (pid $pid) did not stop within 10 s"
