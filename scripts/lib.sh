#!/usr/bin/env bash
# Shared helpers for the start and test scripts. Source it; do not run it.
# Assumes only Node 20 and npm on the machine.

HOOPLINE_ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
PNPM_VERSION="$(node -p "require('$HOOPLINE_ROOT/package.json').packageManager.split('@')[1]")"

log() { printf '\033[1m[hoopline]\033[0m %s\n' "$*" >&2; }

# The pinned pnpm: the global one when it is that version, else a private copy
# in .data/tools (so a different global pnpm is left alone).
ensure_pnpm() {
  if command -v pnpm >/dev/null 2>&1 && [[ "$(pnpm --version 2>/dev/null)" == "$PNPM_VERSION" ]]; then
    return 0
  fi
  local tools="$HOOPLINE_ROOT/.data/tools"
  if [[ ! -x "$tools/node_modules/.bin/pnpm" ]] ||
    [[ "$("$tools/node_modules/.bin/pnpm" --version 2>/dev/null)" != "$PNPM_VERSION" ]]; then
    log "installing pnpm $PNPM_VERSION into .data/tools"
    mkdir -p "$tools"
    npm install --prefix "$tools" --no-audit --no-fund --loglevel=error "pnpm@$PNPM_VERSION" >&2
  fi
  export PATH="$tools/node_modules/.bin:$PATH"
}

ensure_dependencies() {
  ensure_pnpm
  log "installing dependencies from the lockfile"
  (cd "$HOOPLINE_ROOT" && pnpm install --frozen-lockfile >&2) || {
    log "pnpm install failed"
    return 1
  }
}

# Install a Debian package when a file it provides is missing.
ensure_debian_package() {
  local file="$1" package="$2"
  if [[ -e "$file" ]]; then return 0; fi
  if [[ "$(id -u)" != "0" ]]; then
    log "$file is missing: install the Debian package '$package' (apt-get install $package)"
    return 1
  fi
  log "installing Debian package $package (for $file)"
  export DEBIAN_FRONTEND=noninteractive
  if [[ -z "${HOOPLINE_APT_UPDATED:-}" ]]; then
    apt-get update -qq >&2
    export HOOPLINE_APT_UPDATED=1
  fi
  apt-get install -y -qq "$package" >&2
}
