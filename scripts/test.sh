#!/usr/bin/env bash
# npm test: the whole check, the same locally and in CI (.ci/run).
#  1. the project's TEST MariaDB instance (127.0.0.1:3407, own datadir) with database jigwright_test
#     dropped and re-migrated, so every run starts clean and never touches the app's data;
#  2. Debian's chromium for the browser tests (installed if missing; never downloaded by npm);
#  3. typecheck, lint and the client build: any failure stops the run here with a clear message;
#  4. every vitest project (unit, components, api, kernel, e2e) with a JSON report, then the totals on
#     a line of their own: "N passed, N failed".
set -euo pipefail
cd "$(dirname "$0")/.."
mkdir -p .tmp

step() { printf '\n\033[1m==> %s\033[0m\n' "$*"; }
fail() {
  printf '\n\033[1;31mnpm test stopped: %s\033[0m\n' "$*" >&2
  exit 1
}
as_root() {
  if [ "$(id -u)" -eq 0 ]; then "$@"; else sudo -n "$@"; fi
}

rm -f .tmp/vitest.json .tmp/test-totals.txt

# Database settings for the test run; vitest (tests/api/helpers, tests/e2e) reads these.
export TEST_DB_HOST="${TEST_DB_HOST:-127.0.0.1}"
export TEST_DB_PORT="${TEST_DB_PORT:-3407}"
export TEST_DB_NAME="${TEST_DB_NAME:-jigwright_test}"
export TEST_DB_USER="${TEST_DB_USER:-jigwright_test}"
export TEST_DB_PASSWORD="${TEST_DB_PASSWORD:-jigwright-test-only}"

step "MariaDB test instance on ${TEST_DB_HOST}:${TEST_DB_PORT}, fresh database ${TEST_DB_NAME}"
npx tsx scripts/db.ts reset --instance test || fail "could not prepare the test database (see the message above)."

step "Chromium for the browser tests"
if [ ! -x /usr/bin/chromium ]; then
  echo "Installing Debian's chromium package…"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get -o DPkg::Lock::Timeout=300 update -q \
    || fail "apt-get update failed."
  as_root env DEBIAN_FRONTEND=noninteractive apt-get -o DPkg::Lock::Timeout=300 install -y -q --no-install-recommends chromium \
    || fail "could not install chromium (apt-get install chromium)."
fi
/usr/bin/chromium --version 2>/dev/null || true

step "Typecheck (tsc --noEmit)"
npm run -s typecheck || fail "typecheck failed: fix the type errors listed above."

step "Lint (eslint, no warnings allowed)"
npm run -s lint || fail "lint failed: fix the problems listed above."

step "Client build (vite build; the browser tests use it)"
npx vite build --logLevel warn || fail "the client build failed (see above)."

step "Test suites (vitest: unit, components, api, kernel, e2e)"
set +e
npx vitest run --reporter=default --reporter=json --outputFile=.tmp/vitest.json
vitest_rc=$?
set -e

if [ ! -s .tmp/vitest.json ]; then
  fail "vitest wrote no report (exit code ${vitest_rc}); it crashed before finishing (see above)."
fi
totals=$(node -e '
  const r = JSON.parse(require("fs").readFileSync(".tmp/vitest.json", "utf8"));
  process.stdout.write(`${r.numPassedTests} passed, ${r.numFailedTests} failed`);
')
failed=$(node -e 'const r = JSON.parse(require("fs").readFileSync(".tmp/vitest.json", "utf8")); process.stdout.write(String(r.numFailedTests + (r.numFailedTestSuites || 0)))')
printf '%s\n' "$totals" > .tmp/test-totals.txt
echo
echo "$totals"
if [ "$vitest_rc" -ne 0 ] || [ "$failed" -ne 0 ]; then
  exit 1
fi
