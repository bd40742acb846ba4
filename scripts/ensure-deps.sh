#!/usr/bin/env bash
# Installs what Bootwright needs on a fresh machine: the npm packages (when node_modules is missing or older
# than the lockfile) and, with --system, the Debian packages the tests check against.
set -euo pipefail
cd "$(dirname "$0")/.."

if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "== installing npm packages (npm ci)"
  npm ci --no-audit --no-fund
fi

if [ "${1:-}" = "--system" ]; then
  # command -> Debian package
  declare -A pkgs=([chromium]=chromium [dosbox]=dosbox [nasm]=nasm [patch]=patch [unzip]=unzip [zip]=zip)
  missing=()
  for cmd in "${!pkgs[@]}"; do command -v "$cmd" >/dev/null 2>&1 || missing+=("${pkgs[$cmd]}"); done
  if [ ${#missing[@]} -gt 0 ]; then
    if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null 2>&1; then
      echo "== installing Debian packages: ${missing[*]}"
      apt-get update -qq
      DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
    else
      echo "The tests need these Debian packages: ${missing[*]}" >&2
      echo "Install them with: sudo apt-get install ${missing[*]}" >&2
      exit 1
    fi
  fi
fi
