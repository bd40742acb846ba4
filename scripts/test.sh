#!/usr/bin/env bash
# `npm test`: installs what is missing, then type-checks and runs every test: Jest (engine, generators,
# API, components) and Playwright in Debian's chromium against the exported web build.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-deps.sh --system

echo "== typecheck"
npx tsc --noEmit -p .

echo "== jest"
npx jest --ci

echo "== web build"
EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 npx expo export -p web --clear > tmp-export.log 2>&1 || { cat tmp-export.log; exit 1; }
rm -f tmp-export.log

echo "== browser tests (Debian chromium)"
npx playwright test
