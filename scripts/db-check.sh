#!/usr/bin/env bash
# Fails when the Drizzle schema and the committed migrations disagree: regenerates into a scratch copy and compares.
set -euo pipefail
cd "$(dirname "$0")/.."
# drizzle-kit wants paths relative to the working folder, so the scratch copy lives inside the project.
scratch=$(mktemp -d -p . .db-check.XXXXXX)
trap 'rm -rf "$scratch"' EXIT
cp -r apps/server/drizzle "$scratch/drizzle"
echo "export default { dialect: 'sqlite', schema: './apps/server/src/db/schema/index.ts', out: '$scratch/drizzle' };" \
  > "$scratch/drizzle.config.ts"
npx drizzle-kit generate --config "$scratch/drizzle.config.ts" > "$scratch/out.log" 2>&1 || true
# drizzle-kit can exit 0 after an error: read what it said.
if grep -qiE 'error' "$scratch/out.log"; then
  echo "db:check: drizzle-kit failed:"; cat "$scratch/out.log"; exit 1
fi
if ! diff -r apps/server/drizzle "$scratch/drizzle" > "$scratch/diff.log"; then
  echo "db:check: the schema in apps/server/src/db/schema differs from the committed migrations."
  echo "Run 'npm run db:generate -- --name <change>' and commit the new migration."
  cat "$scratch/diff.log" | head -40
  exit 1
fi
echo "db:check: migrations match the schema"
