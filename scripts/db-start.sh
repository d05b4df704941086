#!/usr/bin/env bash
# Starts Roostline's own MariaDB on 127.0.0.1:$DB_PORT with a project-local data directory.
# Idempotent: reuses its own running server; refuses a port held by something else.
source "$(dirname "$0")/common.sh"

ensure_apt mariadbd mariadb-server

if pid_alive "$DB_PID"; then
  log "MariaDB already running (pid $(cat "$DB_PID"), port $DB_PORT)"
else
  if port_in_use "$DB_PORT"; then
    die "port $DB_PORT is held by another program; stop it or set ROOSTLINE_DB_PORT"
  fi
  mkdir -p "$DB_DIR/data" "$DB_DIR/tmp"
  cat > "$DB_CNF" <<CNF
[mariadbd]
user=mysql
datadir=$DB_DIR/data
socket=$DB_SOCKET
pid-file=$DB_PID
log-error=$DB_DIR/error.log
tmpdir=$DB_DIR/tmp
port=$DB_PORT
bind-address=127.0.0.1
character-set-server=utf8mb4
collation-server=utf8mb4_unicode_ci
default-time-zone=+00:00
innodb_log_file_size=8M
innodb_buffer_pool_size=128M
max_connections=300
skip-name-resolve

[client]
socket=$DB_SOCKET
user=root
CNF
  chown -R mysql:mysql "$DB_DIR"
  if [[ ! -d "$DB_DIR/data/mysql" ]]; then
    log "initialising MariaDB data directory in .data/mariadb"
    mariadb-install-db --defaults-file="$DB_CNF" --skip-test-db \
      --auth-root-authentication-method=socket >"$DB_DIR/install.log" 2>&1 \
      || die "mariadb-install-db failed; see .data/mariadb/install.log"
    chown -R mysql:mysql "$DB_DIR"
  fi
  rm -f "$DB_PID"
  setsid mariadbd --defaults-file="$DB_CNF" >/dev/null 2>&1 < /dev/null &
  for _ in $(seq 1 100); do
    if mariadb --defaults-file="$DB_CNF" -e 'SELECT 1' >/dev/null 2>&1; then break; fi
    sleep 0.1
  done
  mariadb --defaults-file="$DB_CNF" -e 'SELECT 1' >/dev/null 2>&1 \
    || die "MariaDB did not answer; see .data/mariadb/error.log"
  log "MariaDB started (pid $(cat "$DB_PID"), 127.0.0.1:$DB_PORT)"
fi

mariadb --defaults-file="$DB_CNF" <<SQL
CREATE DATABASE IF NOT EXISTS roostline CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE DATABASE IF NOT EXISTS roostline_test CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
ALTER USER '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
GRANT ALL PRIVILEGES ON roostline.* TO '$DB_USER'@'127.0.0.1';
GRANT ALL PRIVILEGES ON roostline_test.* TO '$DB_USER'@'127.0.0.1';
FLUSH PRIVILEGES;
SQL
