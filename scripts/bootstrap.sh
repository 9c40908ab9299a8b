#!/bin/sh
# Installs the npm dependencies when node_modules is missing or older than package-lock.json; everything else is
# done in TypeScript, which needs these dependencies first.
set -eu
cd "$(dirname "$0")/.."
marker=node_modules/.package-lock.json
if [ ! -f "$marker" ] || [ package-lock.json -nt "$marker" ]; then
  # npm's own output (progress, deprecation notes) goes to a log; on failure its end is shown.
  mkdir -p .data/logs
  log=.data/logs/npm-ci.log
  echo "Installing npm dependencies (npm ci, output in $log)..."
  if ! npm ci --no-audit --no-fund >"$log" 2>&1; then
    tail -n 25 "$log" >&2
    echo "npm ci failed; the full output is in $log" >&2
    exit 1
  fi
  echo "npm dependencies installed."
fi
