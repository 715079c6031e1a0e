#!/usr/bin/env bash
# Stops the local PostgreSQL cluster and the mail fakes that start.sh and test.sh started. Data stays in .local/.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
source "$ROOT/scripts/postgres.sh"
source "$ROOT/scripts/mail.sh"
stop_mail_fake dev
stop_mail_fake test
stop_postgres
