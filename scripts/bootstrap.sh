#!/bin/sh
# Installs the npm dependencies when node_modules is missing or older than package-lock.json; everything else is
# done in TypeScript, which needs these dependencies first.
set -eu
cd "$(dirname "$0")/.."
marker=node_modules/.package-lock.json
if [ ! -f "$marker" ] || [ package-lock.json -nt "$marker" ]; then
  echo "Installing npm dependencies (npm ci)..."
  npm ci --no-audit --no-fund
fi
