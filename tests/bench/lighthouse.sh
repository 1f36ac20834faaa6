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
exec infra-local/with-test-services.sh "$TSX" tests/bench/lighthouse.ts
