#!/usr/bin/env bash
# npm run lighthouse: Lighthouse scores of the home, search and listing pages (a printed figure, never a test).
# With LIGHTHOUSE_URL set, measures that running app; otherwise starts the test profile's services (stopping only
# those it started) and an app with the demo data on a private database.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."

TSX=node_modules/.bin/tsx
if [ -n "${LIGHTHOUSE_URL:-}" ]; then
  exec "$TSX" tests/bench/lighthouse.ts
fi

RECORD=$(mktemp "${TMPDIR:-/tmp}/benchwright-lighthouse.XXXXXX")
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

"$TSX" tests/bench/lighthouse.ts
