# Shared install steps for the start and test commands (sourced, not run).
# Installs npm packages from the lock file and Debian packages when their binary is missing.

ensure_npm_packages() {
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "Installing npm packages from package-lock.json ..."
    npm ci --no-audit --no-fund
  fi
}

# ensure_debian BINARY PACKAGE... : installs PACKAGE(s) with apt-get when BINARY is not on the PATH.
ensure_debian() {
  local bin="$1"; shift
  if command -v "$bin" >/dev/null 2>&1 || [ -x "/usr/sbin/$bin" ] || [ -x "/usr/bin/$bin" ]; then
    return 0
  fi
  if [ "$(id -u)" -ne 0 ]; then
    echo "Kettlewright needs '$bin'. Install it as root first: apt-get install -y $*" >&2
    exit 1
  fi
  echo "Installing Debian packages: $* ..."
  if [ -z "${KW_APT_UPDATED:-}" ]; then
    apt-get update -qq
    export KW_APT_UPDATED=1
  fi
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@"
}
