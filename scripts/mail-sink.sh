#!/usr/bin/env bash
# Starts (or reuses) the local SMTP stand-in on 127.0.0.1:$SMTP_PORT in the background.
# Usage: mail-sink.sh start|stop  (DATABASE_URL and SMTP_PORT select the database and port)
source "$(dirname "$0")/common.sh"
PORT="${SMTP_PORT:-2525}"
PID_FILE="$DATA_DIR/mail-sink-$PORT.pid"
case "${1:-start}" in
  start)
    if pid_alive "$PID_FILE"; then log "mail stand-in already running on port $PORT"; exit 0; fi
    port_in_use "$PORT" && die "port $PORT is held by another program; set SMTP_PORT"
    mkdir -p "$DATA_DIR"
    (cd "$ROOT" && SMTP_PORT="$PORT" MAIL_SINK_PID_FILE="$PID_FILE" setsid node_modules/.bin/tsx scripts/mail-sink.ts \
      >"$DATA_DIR/mail-sink-$PORT.log" 2>&1 < /dev/null &)
    for _ in $(seq 1 100); do port_in_use "$PORT" && break; sleep 0.1; done
    port_in_use "$PORT" || die "mail stand-in did not start; see .data/mail-sink-$PORT.log"
    log "mail stand-in listening on 127.0.0.1:$PORT"
    ;;
  stop)
    if pid_alive "$PID_FILE"; then kill -TERM "$(cat "$PID_FILE")"; log "mail stand-in stopped"; fi
    ;;
  *) die "usage: mail-sink.sh start|stop" ;;
esac
