#!/usr/bin/env bash
# Clones this repository into a private temporary folder and runs both README commands there, as a new
# machine would: ./scripts/start.sh (until the app answers /api/health, then stops it) and ./scripts/test.sh.
# Usage: scripts/fresh-clone-check.sh [ref]   (default: HEAD). Ports can be moved with the same variables the
# two commands read (PG_PORT, PORT, TEST_PORT, TEST_SMTP_PORT, TEST_INBOX_PORT); defaults below keep clear of a
# copy served from the working tree. The clone is removed afterwards unless KEEP_CLONE=1.
set -euo pipefail
SOURCE="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
REF="${1:-HEAD}"
export PG_PORT="${PG_PORT:-55470}" PORT="${PORT:-3070}"
export TEST_PORT="${TEST_PORT:-3170}" TEST_SMTP_PORT="${TEST_SMTP_PORT:-2576}" TEST_INBOX_PORT="${TEST_INBOX_PORT:-2577}"
DIR="$(mktemp -d)"
cleanup() {
  (cd "$DIR/repo" 2>/dev/null && ./scripts/stop.sh >/dev/null 2>&1) || true
  [ -n "${APP_PID:-}" ] && kill -- "-$APP_PID" 2>/dev/null || true
  if [ "${KEEP_CLONE:-0}" != 1 ]; then
    # As root the clone's cluster may live outside it (scripts/postgres.sh): remove that folder too.
    [ -L "$DIR/repo/.local/pg" ] && rm -rf "$(readlink -f "$DIR/repo/.local/pg")"
    rm -rf "$DIR"
  fi
}
trap cleanup EXIT
say() { printf '[fresh-clone] %s\n' "$*"; }

say "cloning $REF of $SOURCE into $DIR/repo (as $(id -un))"
git clone --quiet "$SOURCE" "$DIR/repo"
cd "$DIR/repo"
git checkout --quiet "$REF"

say "1/2 ./scripts/start.sh (app on 127.0.0.1:$PORT)"
set -m
./scripts/start.sh >"$DIR/start.log" 2>&1 &
APP_PID=$!
set +m
for _ in $(seq 1 900); do
  if curl -fsS "http://127.0.0.1:$PORT/api/health" >/dev/null 2>&1; then break; fi
  if ! kill -0 "$APP_PID" 2>/dev/null; then tail -n 40 "$DIR/start.log"; say "start.sh exited before the app answered"; exit 1; fi
  sleep 1
done
curl -fsS "http://127.0.0.1:$PORT/api/health" >/dev/null || { tail -n 40 "$DIR/start.log"; say "the app did not answer /api/health"; exit 1; }
say "the app answers /api/health"
kill -- "-$APP_PID" 2>/dev/null || true
wait "$APP_PID" 2>/dev/null || true
APP_PID=""
# The test command starts its own mail fake on the test ports; the dev one started above is stopped here.
./scripts/stop.sh >/dev/null 2>&1 || true

say "2/2 ./scripts/test.sh"
if ./scripts/test.sh >"$DIR/test.log" 2>&1; then
  sed -n '/Summary/,$p' "$DIR/test.log"
  say "both commands passed"
else
  grep -aE "FAIL|✘|×|Error:" "$DIR/test.log" | sed 's/\x1b\[[0-9;]*m//g' | head -n 40 || true
  sed -n '/Summary/,$p' "$DIR/test.log"
  say "the test command failed"
  exit 1
fi
