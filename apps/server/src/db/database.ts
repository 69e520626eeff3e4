import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { drizzle, type BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import * as schema from './schema/index.js';

export type Db = BetterSQLite3Database<typeof schema> & { $client: Database.Database };

/** The committed migrations: apps/server/drizzle, the same depth from src/db and dist/db. */
export const MIGRATIONS_FOLDER = fileURLToPath(new URL('../../drizzle', import.meta.url));

/**
 * Opens the SQLite file with the pragmas Jarday relies on (WAL for a reader beside the writer,
 * foreign keys, a busy timeout) and applies any migration not yet applied.
 */
export function openDatabase(path: string): Db {
  mkdirSync(dirname(path), { recursive: true });
  const sqlite = new Database(path);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  sqlite.pragma('synchronous = NORMAL');
  // Every live command commits; checkpointing (which syncs) every 4,000 pages rather than 1,000 takes a quarter
  // off a command's cost under load (npm run bench) for a WAL file of at most about 16 MB.
  sqlite.pragma('wal_autocheckpoint = 4000');
  const db = drizzle(sqlite, { schema });
  migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
  return db;
}
