#!/usr/bin/env bash
# npm run bench: benchmarks with printed figures (never timed tests), each against a baseline measured in the same run.
# Runs on the test profile's services, in their benchwright_bench database; stops only the services it started.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."

if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  npm ci
fi

exec infra-local/with-test-services.sh env DB_NAME=benchwright_bench node_modules/.bin/tsx tests/bench/run.ts
