#!/usr/bin/env bash
# npm start: dev services, migrations, a one-time seed, the client build, then the server.
# Ctrl-C stops the server and only the services this run started.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."

TSX=node_modules/.bin/tsx

if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  npm ci
fi

RECORD=$(mktemp "${TMPDIR:-/tmp}/benchwright-start.XXXXXX")
APP_PID=
cleanup() {
  local status=$?
  trap - EXIT INT TERM
  if [ -n "$APP_PID" ] && kill -0 "$APP_PID" 2>/dev/null; then
    kill -TERM "$APP_PID" 2>/dev/null || true
    wait "$APP_PID" 2>/dev/null || true
  fi
  "$TSX" infra-local/services.ts down --profile dev --only "$RECORD" || true
  rm -f "$RECORD"
  exit "$status"
}
trap cleanup EXIT
trap 'exit 130' INT
trap 'exit 143' TERM

"$TSX" infra-local/services.ts up --profile dev --record "$RECORD"
set -a
# shellcheck source=/dev/null
. .local/dev/services.env
set +a
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true # the SDK warns on every start that later versions will need Node 22

npm run db:migrate
if [ ! -f .local/dev/seeded ]; then
  npm run db:seed
  touch .local/dev/seeded
fi
npm run build

echo
echo "Benchwright: $APP_ORIGIN"
echo "Local inbox: $MAIL_INBOX_URL"
if [ -f server/db/seeds/print-demo-accounts.ts ]; then
  "$TSX" server/db/seeds/print-demo-accounts.ts
fi
echo

# In the background so the traps run at once on Ctrl-C or SIGTERM; the script waits for it.
"$TSX" server/index.ts &
APP_PID=$!
wait "$APP_PID"
