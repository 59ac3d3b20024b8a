#!/usr/bin/env bash
# npm run bench: build the client, then measure the API against the machine's own ceiling (scripts/bench.ts).
# Uses its own MariaDB instance (.data-bench/, port 3310) seeded with ten years of a busy brewery.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/install.sh
ensure_npm_packages
ensure_debian mariadbd mariadb-server mariadb-client
echo "Building the client (for the initial JavaScript size) ..."
npx vite build --logLevel warn
exec node --import tsx scripts/bench.ts "$@"
