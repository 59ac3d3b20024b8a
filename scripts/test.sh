#!/usr/bin/env bash
# npm test: install what is missing, a fresh test database on its own port, then every check.
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/install.sh
set -e
ensure_npm_packages
ensure_debian mariadbd mariadb-server mariadb-client
ensure_debian chromium chromium
mkdir -p .data-test
npx tsx scripts/test-setup.ts > .data-test/env.sh
source .data-test/env.sh
set +e

status=0
echo "== Type check (tsc --noEmit)"
npx tsc --noEmit || status=1

echo "== Client build (for the browser tests)"
# NODE_ENV=test is exported for the tests; the client is always built for production.
NODE_ENV=production npx vite build --logLevel warn || status=1

echo "== Vitest: unit, API, component and browser tests"
npx vitest run "$@" || status=1

exit $status
