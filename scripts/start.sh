#!/usr/bin/env bash
# `npm start`: installs, builds the web app and starts Bootwright on its embedded defaults: the SQLite file
# data/bootwright.db (migrated, and seeded with the demo data when empty) and the local mail fake.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-deps.sh
echo "== building the web app"
EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 npx expo export -p web > /dev/null
echo "== starting on http://localhost:${PORT:-3000}"
exec node_modules/.bin/tsx server/index.ts
