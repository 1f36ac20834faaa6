#!/usr/bin/env bash
# npm test: test services, migrations, then typecheck, lint and vitest.
# Runs every check; exits with the first failing check's code. Stops only what it started.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."

TSX=node_modules/.bin/tsx
banner() { printf '\n==== %s ====\n' "$*"; }

banner "dependencies"
if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  npm ci
else
  echo "node_modules is up to date"
fi

banner "chromium"
if [ ! -x /usr/bin/chromium ]; then
  if [ "$(id -u)" -ne 0 ]; then
    echo "/usr/bin/chromium is missing. Install it with:" >&2
    echo "  sudo sh -c 'apt-get update && DEBIAN_FRONTEND=noninteractive apt-get install -y chromium'" >&2
    exit 1
  fi
  apt-get update
  DEBIAN_FRONTEND=noninteractive apt-get install -y chromium
fi
/usr/bin/chromium --version 2>/dev/null # its wrapper script warns on stderr

RECORD=$(mktemp "${TMPDIR:-/tmp}/benchwright-test.XXXXXX")
cleanup() {
  local status=$?
  trap - EXIT INT TERM
  banner "stopping the services this run started"
  "$TSX" infra-local/services.ts down --profile test --only "$RECORD" || true
  rm -f "$RECORD"
  exit "$status"
}
trap cleanup EXIT
trap 'exit 130' INT
trap 'exit 143' TERM

banner "services (test profile)"
"$TSX" infra-local/services.ts up --profile test --record "$RECORD"
set -a
# shellcheck source=/dev/null
. .local/test/services.env
set +a
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true # the SDK warns on every start that later versions will need Node 22

banner "db:migrate"
npm run db:migrate

first_failure=0
summary=()
check() {
  local name=$1 rc=0
  shift
  banner "$name"
  "$@" || rc=$?
  if [ "$rc" -eq 0 ]; then
    summary+=("passed  $name")
  else
    summary+=("FAILED  $name (exit $rc)")
    if [ "$first_failure" -eq 0 ]; then first_failure=$rc; fi
  fi
}
check typecheck npm run typecheck
check lint npm run lint
rm -f tests/.artifacts/vitest-results.json
check vitest node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile.json=tests/.artifacts/vitest-results.json

banner "summary"
printf '%s\n' "${summary[@]}"
# One plain closing line: the test counts, with each failed check (typecheck, lint) counted as a failure.
failed_checks=$(printf '%s\n' "${summary[@]}" | grep -c '^FAILED' || true)
FAILED_CHECKS=$failed_checks node -e '
  const fs = require("node:fs");
  const extra = Number(process.env.FAILED_CHECKS || 0);
  const file = "tests/.artifacts/vitest-results.json";
  if (!fs.existsSync(file)) { console.log(`0 passed, ${Math.max(extra, 1)} failed`); process.exit(0); }
  const r = JSON.parse(fs.readFileSync(file, "utf8"));
  console.log(`${r.numPassedTests} passed, ${r.numFailedTests + (r.numFailedTests ? 0 : extra)} failed, ${r.numPendingTests + (r.numTodoTests || 0)} skipped`);
'
exit "$first_failure"
