/**
 * Loads the demo scenario into an EMPTY database (it refuses to touch one that has users).
 * Run with `npm run db:seed`; settings come from the same validated schema as the server's.
 */
import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { hashPassword } from '../apps/server/src/auth/passwords.js';
import { validateConfig } from '../apps/server/src/config/config.schema.js';
import { openDatabase, type Db } from '../apps/server/src/db/database.js';
import { canners, kitchens, memberships, recipes, users } from '../apps/server/src/db/schema/index.js';
import { findStarter } from '../apps/server/src/recipes/starter-recipes.js';
import { crewOf, loadHistory } from './history.js';
import { type Seed, seedSchema } from './seed-schema.js';

export const DEMO_SEED_FILE = fileURLToPath(new URL('./demo-kitchen.json', import.meta.url));

export function readSeed(file = DEMO_SEED_FILE): Seed {
  return seedSchema.parse(JSON.parse(readFileSync(file, 'utf8')));
}

/** Returns false (and writes nothing) when the database already has people in it. */
export async function loadSeed(db: Db, seed: Seed, now = new Date()): Promise<boolean> {
  const { n } = db.$client.prepare('select count(*) as n from users').get() as { n: number };
  if (n > 0) return false;
  // Hash before the transaction: better-sqlite3 transactions are synchronous.
  const people = await Promise.all(
    seed.people.map(async (p) => ({ ...p, id: randomUUID(), passwordHash: await hashPassword(p.password) })),
  );
  const kitchenId = randomUUID();
  db.transaction((tx) => {
    for (const p of people) {
      tx.insert(users)
        .values({ id: p.id, email: p.email, name: p.name, passwordHash: p.passwordHash, createdAt: now })
        .run();
    }
    tx.insert(kitchens)
      .values({
        id: kitchenId,
        name: seed.kitchen.name,
        altitudeValue: seed.kitchen.altitude.value,
        altitudeUnit: seed.kitchen.altitude.unit,
        units: seed.kitchen.units,
        createdAt: now,
      })
      .run();
    for (const p of people)
      tx.insert(memberships).values({ kitchenId, userId: p.id, role: p.role, joinedAt: now }).run();
    for (const c of seed.canners)
      tx.insert(canners)
        .values({ id: randomUUID(), kitchenId, createdAt: now, ...c })
        .run();
    const lead = people.find((p) => p.role === 'lead');
    for (const starterId of seed.recipes) {
      const starter = findStarter(starterId);
      if (!starter) throw new Error(`seed: no starter recipe ${starterId}`);
      const { id: _id, kitchenId: _k, copiedFrom: _c, createdAt: _a, updatedAt: _u, ...data } = starter;
      tx.insert(recipes)
        .values({
          id: randomUUID(),
          kitchenId,
          name: data.name,
          data,
          copiedFrom: starterId,
          createdBy: lead?.id ?? null,
          createdAt: now,
          updatedAt: now,
        })
        .run();
    }
    // Past days come last: they need the people, canners and recipes above.
    loadHistory(db, kitchenId, seed.history, crewOf(people), now.getTime());
  });
  return true;
}

async function main(): Promise<void> {
  const config = validateConfig(process.env);
  const db = openDatabase(config.databasePath);
  try {
    const loaded = await loadSeed(db, readSeed());
    console.log(
      loaded
        ? `Demo kitchen loaded into ${config.databasePath}`
        : `${config.databasePath} already has people in it: demo data not loaded`,
    );
  } finally {
    db.$client.close();
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  main().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
