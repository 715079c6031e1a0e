#!/usr/bin/env bash
# The whole test suite from a fresh state: the same preparation as start.sh with a fresh, separate test
# database, then unit tests, database tests and browser tests (Playwright driving Debian's Chromium).
# Exits non-zero when any stage fails; every stage runs so one report shows all failures.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
source "$ROOT/scripts/postgres.sh"
source "$ROOT/scripts/mail.sh"
source "$ROOT/scripts/app.sh"

prepare_machine
recreate_database fadeline_test
load_env_file
# Test settings override .env: their own database, mail fake, port and build folder.
export DATABASE_URL="${DATABASE_URL%/*}/fadeline_test"
# Every port can be set from the environment, so two clones can test side by side.
export TEST_PORT="${TEST_PORT:-3100}"
TEST_SMTP_PORT="${TEST_SMTP_PORT:-2526}"
TEST_INBOX_PORT="${TEST_INBOX_PORT:-2581}"
export NEXTAUTH_URL="http://127.0.0.1:$TEST_PORT"
export SMTP_URL="smtp://127.0.0.1:$TEST_SMTP_PORT"
export DEV_MAIL_INBOX_URL="http://127.0.0.1:$TEST_INBOX_PORT"
export FADELINE_DEV_INBOX=1
export NEXT_DIST_DIR=.next-test
export CHROMIUM_PATH="${CHROMIUM_PATH:-/usr/bin/chromium}"
[ -x "$CHROMIUM_PATH" ] || apt_install chromium fonts-liberation
port_open "$TEST_PORT" && die "Port $TEST_PORT is in use; the browser tests serve the app there."

stop_mail_fake test
start_mail_fake "$TEST_SMTP_PORT" "$TEST_INBOX_PORT" test
trap 'stop_mail_fake test' EXIT
migrate_and_seed
build_tiles

declare -a SUMMARY=()
FAILED=0
stage() { # name, command...
  local name="$1" started=$SECONDS; shift
  log "── $name"
  if "$@"; then SUMMARY+=("ok    $name ($((SECONDS - started)) s)");
  else SUMMARY+=("FAIL  $name ($((SECONDS - started)) s)"); FAILED=1; fi
}

stage "type check" node_modules/.bin/tsc --noEmit
stage "unit tests" node_modules/.bin/vitest run --project unit
stage "database tests" node_modules/.bin/vitest run --project db
stage "build for browser tests" build_app .next-test
stage "browser tests" node_modules/.bin/playwright test

log "Summary"
printf '  %s\n' "${SUMMARY[@]}"
exit "$FAILED"
