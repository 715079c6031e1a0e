#!/usr/bin/env bash
# Fadeline, locally: installs what is missing, starts PostgreSQL and the mail fake on loopback, applies the
# migrations, seeds the demo scenario, builds the app and serves it on $PORT (default 3000).
# Safe to run again: each step reuses what an earlier run made. Stop the services with scripts/stop.sh.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
source "$ROOT/scripts/postgres.sh"
source "$ROOT/scripts/mail.sh"
source "$ROOT/scripts/app.sh"

PORT="${PORT:-3000}"
HOST="${HOST:-127.0.0.1}"

prepare_machine
ensure_database fadeline
load_env_file
export NEXTAUTH_URL="${NEXTAUTH_URL:-http://127.0.0.1:$PORT}"
start_mail_fake 2525 2580 dev
export FADELINE_DEV_INBOX=1

migrate_and_seed
build_tiles
build_app .next

cat <<MSG

  Fadeline is starting on $NEXTAUTH_URL
$SEED_REPORT
  Captured e-mail: $NEXTAUTH_URL/dev/inbox     Stop the database and mail fake: scripts/stop.sh

MSG
exec node_modules/.bin/next start -H "$HOST" -p "$PORT"
