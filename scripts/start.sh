#!/usr/bin/env bash
# One command from a fresh clone to a running demo: npm packages, MariaDB, migrations, demo data,
# the SMTP stand-in, a production build, and the app on http://127.0.0.1:3000.
source "$(dirname "$0")/common.sh"
cd "$ROOT"
APP_PORT="${PORT:-3000}"

ensure_node_modules
ensure_secret
bash scripts/db-start.sh
node_modules/.bin/tsx scripts/migrate.ts
node_modules/.bin/tsx scripts/seed.ts
bash scripts/mail-sink.sh start

log "building the app"
node node_modules/next/dist/bin/next build > "$DATA_DIR/build.log" 2>&1 || { tail -40 "$DATA_DIR/build.log"; die "next build failed (full log: .data/build.log)"; }

port_in_use "$APP_PORT" && die "port $APP_PORT is held by another program; stop it or set PORT"
cat <<MSG

  Roostline is starting on http://127.0.0.1:$APP_PORT
  Sign in at http://127.0.0.1:$APP_PORT/sign-in as admin@hollowmere.example / roostline-admin
  (every demo account is listed on the sign-in page and in README.md).
  Captured e-mail: Mail in the admin menu. Stop with Ctrl+C; scripts/db-stop.sh stops MariaDB.

MSG
export ROOSTLINE_DEMO="${ROOSTLINE_DEMO:-on}" APP_URL="${APP_URL:-http://127.0.0.1:$APP_PORT}"
exec node node_modules/next/dist/bin/next start -H 127.0.0.1 -p "$APP_PORT"
