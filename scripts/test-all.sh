#!/usr/bin/env bash
# Every check and every test suite, in the order a failure is cheapest to read.
# The last line sums the test suites as "N passed, N failed" (", N skipped" when any were).
set -uo pipefail
cd "$(dirname "$0")/.."
export SCARF_ANALYTICS=false
reports=$(mktemp -d)
trap 'rm -rf "$reports"' EXIT
failed_steps=()

step() {
  local name=$1; shift
  echo; echo "=== $name"
  if ! "$@"; then failed_steps+=("$name"); fi
}

ensure_chromium() {
  if command -v chromium >/dev/null 2>&1 || [ -x /usr/bin/chromium ]; then return 0; fi
  echo "Installing Debian's chromium for the browser tests"
  local sudo=''
  [ "$(id -u)" = 0 ] || sudo='sudo'
  $sudo apt-get update -qq && DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq chromium >/dev/null
}

step 'format (prettier)' npx prettier --check . --log-level warn
step 'lint (eslint)' npx eslint . --max-warnings 0
step 'types (tsc)' npm run -s check
step 'migrations match the schema' bash scripts/db-check.sh
step 'alarm sounds match their script' node scripts/make-sounds.mjs --check
step 'build' npm run -s build
step 'unit, service, server e2e and web tests (vitest)' \
  npx vitest run --reporter=default --reporter=json --outputFile.json="$reports/vitest.json"
step 'chromium' ensure_chromium
step 'browser tests (playwright, Debian chromium)' \
  env PLAYWRIGHT_JSON_OUTPUT_NAME="$reports/playwright.json" npx playwright test -c apps/web/e2e/playwright.config.ts --reporter=list,json

node scripts/sum-tests.mjs "$reports/vitest.json" "$reports/playwright.json"
sum_rc=$?
if [ ${#failed_steps[@]} -gt 0 ]; then
  echo "Failed steps: ${failed_steps[*]}" >&2
  # The counts line must stay last: say it once more after the failure list.
  node scripts/sum-tests.mjs --quiet "$reports/vitest.json" "$reports/playwright.json"
  exit 1
fi
exit $sum_rc
