#!/usr/bin/env bash
# npm run bench: benchmarks with printed figures (never timed tests), each against a baseline measured in the same run.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  npm ci
fi
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
node_modules/.bin/tsx tests/bench/run.ts
