#!/usr/bin/env bash
# npm start: install what is missing, start our own MariaDB, migrate, seed once, build, serve.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/install.sh
ensure_npm_packages
ensure_debian mariadbd mariadb-server mariadb-client
exec npx tsx scripts/start.ts
