# Shared settings for Roostline's shell scripts. Sourced, not run.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
export ROOT
export NEXT_TELEMETRY_DISABLED=1
# mariadbd lives in /usr/sbin, which a non-login shell may not have on its PATH.
export PATH="$PATH:/usr/local/sbin:/usr/sbin:/sbin"
DATA_DIR="$ROOT/.data"
DB_DIR="${ROOSTLINE_DB_DIR:-$DATA_DIR/mariadb}"
DB_PORT="${ROOSTLINE_DB_PORT:-3317}"
DB_SOCKET="$DB_DIR/mariadb.sock"
DB_PID="$DB_DIR/mariadb.pid"
DB_CNF="$DB_DIR/my.cnf"
DB_USER="roostline"
DB_PASSWORD="${ROOSTLINE_DB_PASSWORD:-roostline-dev}"

log() { printf '\033[1m[roostline]\033[0m %s\n' "$*"; }
die() { printf '[roostline] error: %s\n' "$*" >&2; exit 1; }

# True when something accepts TCP connections on 127.0.0.1:$1.
port_in_use() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

# True when the pid file names a live, non-zombie process.
pid_alive() {
  local file="$1" pid state
  [[ -f "$file" ]] || return 1
  pid="$(cat "$file" 2>/dev/null)" || return 1
  [[ -n "$pid" ]] || return 1
  state="$(ps -o stat= -p "$pid" 2>/dev/null | tr -d ' ')" || return 1
  [[ -n "$state" && "$state" != Z* ]]
}

# Makes sure .env.local holds a random auth secret, so no hand-made .env is needed.
ensure_secret() {
  local envfile="$ROOT/.env.local"
  if ! grep -qs '^BETTER_AUTH_SECRET=' "$envfile"; then
    printf 'BETTER_AUTH_SECRET=%s\n' "$(node -e 'console.log(require("crypto").randomBytes(32).toString("base64url"))')" >> "$envfile"
    log "wrote a new random BETTER_AUTH_SECRET to .env.local"
  fi
  if ! grep -qs '^DEVICE_SIGNING_KEY=' "$envfile"; then
    printf 'DEVICE_SIGNING_KEY=%s\n' "$(node -e 'const { generateKeyPairSync } = require("crypto"); const { privateKey } = generateKeyPairSync("ed25519"); console.log(privateKey.export({ type: "pkcs8", format: "der" }).toString("base64"))')" >> "$envfile"
    log "wrote a new Ed25519 device signing key to .env.local"
  fi
}

# Installs npm packages when node_modules is missing or older than the lock file.
ensure_node_modules() {
  if [[ ! -d "$ROOT/node_modules" || "$ROOT/package-lock.json" -nt "$ROOT/node_modules/.package-lock.json" ]]; then
    log "installing npm packages (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund)
  fi
}

# Installs a Debian package when the command it provides is missing.
ensure_apt() {
  local cmd="$1" pkg="$2"
  command -v "$cmd" >/dev/null 2>&1 && return 0
  log "installing Debian package $pkg"
  local sudo=""
  if [[ "$(id -u)" -ne 0 ]]; then
    sudo -n true 2>/dev/null || die "installing $pkg needs root: run this as root or with passwordless sudo"
    sudo="sudo -n"
  fi
  # A freshly booted machine may still hold the dpkg lock for its own updates: wait for it.
  $sudo apt-get -o DPkg::Lock::Timeout=300 update -qq
  DEBIAN_FRONTEND=noninteractive $sudo apt-get -o DPkg::Lock::Timeout=300 install -y -qq "$pkg" >/dev/null
}
