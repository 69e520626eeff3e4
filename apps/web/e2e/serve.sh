#!/usr/bin/env bash
# The server the browser tests drive: the real build, a fresh database, the demo data, demo mode on.
set -euo pipefail
cd "$(dirname "$0")/../../.."
port=${1:-3199}
data=$(mktemp -d -t jarday-browser-XXXXXX)
export DATABASE_PATH="$data/jarday.sqlite" PORT="$port" HOST=127.0.0.1 DEMO_MODE=true NODE_ENV=test
export SIGNIN_THROTTLE_LIMIT=200
# Invites and reminders go to the loopback mail catcher, read at /api/dev/mail (mail.spec.ts).
export MAIL_CATCHER=true
npx tsx seeds/load.ts
exec node apps/server/dist/main.js
