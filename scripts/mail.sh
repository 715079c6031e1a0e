# The local mail fake (scripts/mail-fake.ts): SMTP in, captured mail out over a small HTTP API. Sourced.

start_mail_fake() { # smtp-port http-port name
  local pidfile="$LOCAL/run/mail-$3.pid"
  if port_open "$1" && port_open "$2"; then return 0; fi
  log "Starting the mail fake ($3): SMTP 127.0.0.1:$1, inbox API 127.0.0.1:$2"
  nohup node_modules/.bin/tsx scripts/mail-fake.ts --smtp-port "$1" --http-port "$2" \
    >"$LOCAL/log/mail-$3.log" 2>&1 &
  echo $! > "$pidfile"
  wait_for_port "$1" 20 "The mail fake"
  wait_for_port "$2" 20 "The mail fake"
}

stop_mail_fake() { # name
  local pidfile="$LOCAL/run/mail-$1.pid"
  [ -f "$pidfile" ] || return 0
  kill "$(cat "$pidfile")" 2>/dev/null && log "Mail fake ($1) stopped" || true
  rm -f "$pidfile"
}
