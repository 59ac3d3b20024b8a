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
# Stop the test database at the end only if this run started it.
started_db=1
if [ -f .data-test/mariadb.pid ] && kill -0 "$(cat .data-test/mariadb.pid)" 2>/dev/null; then started_db=0; fi
npx tsx scripts/test-setup.ts > .data-test/env.sh
source .data-test/env.sh
set +e

status=0
echo "== Formatting (prettier --check)"
npx prettier --check . --log-level warn || status=1

echo "== Lint (eslint: type-aware rules, hooks, import boundaries, no cycles)"
npx eslint . || status=1

echo "== Type check (tsc -b: shared, server, client and browser-test projects)"
npx tsc -b || status=1

echo "== Client build (for the browser tests)"
# NODE_ENV=test is exported for the tests; the client is always built for production.
NODE_ENV=production npx vite build --logLevel warn || status=1

# One Vitest run per group, in this order, so the API tests and the browser tests never use the test database at
# the same moment: the browser tests' global setup seeds it and starts a server (with its overdue-reading sweep)
# as soon as their run begins, before any group of that run.
for projects in "unit component" "api" "e2e"; do
  echo "== Vitest: $projects"
  npx vitest run $(printf -- '--project %s ' $projects) --passWithNoTests "$@" || status=1
done

if [ "$started_db" = 1 ]; then npx tsx scripts/db-stop.ts test >/dev/null; fi
exit $status
