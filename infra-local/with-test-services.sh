#!/usr/bin/env bash
# Run one command with the test profile's services up and their settings in its environment; afterwards stop only
# the services this run started. Used by `npm run bench` and `npm run lighthouse` (printed figures, not tests).
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."

TSX=node_modules/.bin/tsx
RECORD=$(mktemp "${TMPDIR:-/tmp}/benchwright-services.XXXXXX")
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
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true

"$@"
