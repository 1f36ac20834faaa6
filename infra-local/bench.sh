#!/usr/bin/env bash
# npm run bench: benchmarks with printed figures (never timed tests), each against a baseline measured in the same run.
# Runs on the test profile's services, in their benchwright_bench database; stops only the services it started.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."

TSX=node_modules/.bin/tsx

if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  npm ci
fi

RECORD=$(mktemp "${TMPDIR:-/tmp}/benchwright-bench.XXXXXX")
cleanup() {
  local status=$?
  trap - EXIT INT TERM
  "$TSX" infra-local/services.ts down --profile test --only "$RECORD" || true
  rm -f "$RECORD"
  exit "$status"
}
trap cleanup EXIT
trap 'exit 130' INT
trap 'exit 143' TERM

"$TSX" infra-local/services.ts up --profile test --record "$RECORD"
set -a
# shellcheck source=/dev/null
. .local/test/services.env
set +a
export DB_NAME=benchwright_bench
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true

"$TSX" tests/bench/run.ts
