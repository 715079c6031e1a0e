# App steps shared by start.sh and test.sh: install, migrate, seed, build. Sourced after lib.sh.

prepare_machine() {
  ensure_node
  ensure_node_modules
  ensure_env_file
  ensure_postgres_running
  ensure_app_role
}

load_env_file() { set -a; . ./.env; set +a; }

migrate_and_seed() {
  log "Applying migrations"
  node_modules/.bin/tsx db/migrate.ts
  log "Seeding the demo scenario"
  # The react-server condition lets the seed use the server-only data-access layer.
  SEED_REPORT="$(node --conditions=react-server --import tsx db/seed.ts)" || die "Seeding the demo scenario failed."
}

# The self-hosted world basemap (public/tiles/world.pmtiles), built from npm data; skipped when up to date.
build_tiles() {
  node_modules/.bin/tsx scripts/build-tiles.ts || die "Building the map tiles failed."
  node_modules/.bin/tsx scripts/build-demo-region.ts || die "Building the demo region's map tiles failed."
}

# Builds into the given folder unless a build there is newer than every source file.
build_app() { # dist-dir
  local dist="$1"
  if [ -f "$dist/BUILD_ID" ] && [ -f build/workers/gpx-worker.mjs ] && [ -f build/workers/heat-worker.mjs ] && [ -z "$(find app components lib db public scripts types tests proxy.ts next.config.ts playwright.config.ts \
      package-lock.json tsconfig.json postcss.config.mjs -newer "$dist/BUILD_ID" -print -quit 2>/dev/null)" ]; then
    log "Build in $dist is up to date"
    return 0
  fi
  log "Building the app into $dist"
  node scripts/build-workers.mjs && NEXT_DIST_DIR="$dist" node_modules/.bin/next build
}
