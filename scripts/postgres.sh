# PostgreSQL from Debian, as a project-local cluster on 127.0.0.1:$PG_PORT. Sourced after lib.sh.

pg_bin_dir() { ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1; }

ensure_postgres_installed() {
  if [ -z "$(pg_bin_dir)" ] || [ ! -x "$(pg_bin_dir)/initdb" ]; then apt_install postgresql; fi
  PGBIN="$(pg_bin_dir)"
  [ -x "$PGBIN/initdb" ] || die "PostgreSQL server binaries were not found after installing postgresql."
}

# As root the server runs as the Debian 'postgres' user, which must be able to reach the cluster folder.
# When the clone lives where that user cannot go (e.g. under /root), the cluster sits in /var/lib/fadeline
# and .local/pg links to it.
pg_prepare_dir() {
  PGROOT="$LOCAL/pg"
  if is_root; then
    if [ ! -e "$PGROOT" ] && ! su postgres -s /bin/sh -c "test -x '$LOCAL'" 2>/dev/null; then
      local elsewhere="/var/lib/fadeline/$(printf '%s' "$ROOT" | sha256sum | cut -c1-12)"
      mkdir -p "$elsewhere" && ln -s "$elsewhere" "$PGROOT"
      log "PostgreSQL cannot reach $LOCAL as user postgres; the cluster lives in $elsewhere"
    fi
    mkdir -p "$PGROOT" && chown -R postgres:postgres "$PGROOT/" && chmod 700 "$PGROOT/"
    # Every command run as postgres must use the real folder, never the link inside the private clone.
    PGROOT="$(readlink -f "$PGROOT")"
  else
    mkdir -p "$PGROOT" && chmod 700 "$PGROOT"
  fi
}

as_pg() { if is_root; then su postgres -s /bin/sh -c "cd / && $*"; else sh -c "$*"; fi; }

ensure_postgres_running() {
  ensure_postgres_installed
  pg_prepare_dir
  local pwfile="$PGROOT/superuser-password"
  if [ ! -f "$PGROOT/data/PG_VERSION" ]; then
    log "Creating a PostgreSQL cluster in $PGROOT/data"
    random_secret > "$pwfile.new" && chmod 600 "$pwfile.new"
    is_root && chown postgres:postgres "$pwfile.new"
    as_pg "'$PGBIN/initdb' -D '$PGROOT/data' -U postgres --pwfile='$pwfile.new' --auth=scram-sha-256 -E UTF8 --locale=C.UTF-8" >"$LOCAL/log/initdb.log" 2>&1 \
      || die "initdb failed; see $LOCAL/log/initdb.log"
    mv "$pwfile.new" "$pwfile"
  fi
  if ! as_pg "'$PGBIN/pg_ctl' -D '$PGROOT/data' status" >/dev/null 2>&1; then
    log "Starting PostgreSQL on 127.0.0.1:$PG_PORT"
    as_pg "'$PGBIN/pg_ctl' -D '$PGROOT/data' -l '$PGROOT/server.log' -w -t 60 -o \"-c listen_addresses=127.0.0.1 -p $PG_PORT -k '$PGROOT'\" start" >/dev/null \
      || die "PostgreSQL did not start; see $PGROOT/server.log"
  fi
  export PGPASSWORD="$(cat "$pwfile")"
}

psql_admin() { "$PGBIN/psql" -h 127.0.0.1 -p "$PG_PORT" -U postgres -d postgres -v ON_ERROR_STOP=1 -qtA "$@"; }

# The app's login role (password from DATABASE_URL in .env) and one database it owns.
ensure_app_role() {
  local password
  password="$(env_value DATABASE_URL | sed -E 's#^postgres://[^:]+:([^@]+)@.*#\1#')"
  psql_admin -c "do \$\$ begin
      if not exists (select from pg_roles where rolname = '$PG_ROLE') then create role $PG_ROLE login createdb; end if;
    end \$\$;"
  psql_admin -c "alter role $PG_ROLE with login createdb password '$password'"
}

ensure_database() { # name
  if [ -z "$(psql_admin -c "select 1 from pg_database where datname = '$1'")" ]; then
    psql_admin -c "create database $1 owner $PG_ROLE"
  fi
}

recreate_database() { # name
  psql_admin -c "drop database if exists $1 with (force)"
  psql_admin -c "create database $1 owner $PG_ROLE"
}

stop_postgres() {
  PGBIN="$(pg_bin_dir)"; PGROOT="$(readlink -f "$LOCAL/pg" 2>/dev/null || printf '%s' "$LOCAL/pg")"
  [ -n "$PGBIN" ] && [ -f "$PGROOT/data/PG_VERSION" ] || return 0
  as_pg "'$PGBIN/pg_ctl' -D '$PGROOT/data' -m fast -w stop" >/dev/null 2>&1 && log "PostgreSQL stopped" || true
}
