#!/usr/bin/env bash
# npm run dev: Vite's dev server with the API proxied; the API restarts when server code changes.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/install.sh
ensure_npm_packages
ensure_debian mariadbd mariadb-server mariadb-client
exec npx tsx scripts/dev.ts
