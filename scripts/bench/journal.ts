/**
 * Journal appends per second through Jarday's JournalRepository (sequence number + row, one transaction each, as
 * every command does), against raw better-sqlite3 inserts of the same rows, one transaction each, same pragmas.
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import Database from 'better-sqlite3';
import { ROOT } from './support.js';

const N = 20_000;

export async function benchJournal(): Promise<Record<string, string>> {
  const dist = (p: string) => pathToFileURL(join(ROOT, 'apps/server/dist', p)).href;
  const { openDatabase } = (await import(
    dist('db/database.js')
  )) as typeof import('../../apps/server/src/db/database.js');
  const { JournalRepository } = (await import(
    dist('journal/journal.repository.js')
  )) as typeof import('../../apps/server/src/journal/journal.repository.js');

  const dir = mkdtempSync(join(tmpdir(), 'jarday-journal-bench-'));
  const db = openDatabase(join(dir, 'jarday.sqlite'));
  const now = Date.now();
  db.$client.exec(`
    insert into users (id, email, name, password_hash, created_at) values ('u1', 'b@k.test', 'B', 'x', ${now});
    insert into kitchens (id, name, altitude_value, altitude_unit, units, created_at) values ('k1', 'K', 0, 'ft', 'us', ${now});
    insert into days (id, kitchen_id, date, title, altitude_value, altitude_unit, status, last_seq, created_at)
      values ('d1', 'k1', '2026-08-03', 'Bench', 0, 'ft', 'open', 0, ${now}), ('d2', 'k1', '2026-08-03', 'Raw', 0, 'ft', 'open', 0, ${now});
  `);
  const repo = new JournalRepository(db);
  const payload = { timerId: 't1', from: 'running', to: 'done', detail: { dueAt: now, lateByMs: 3 } };

  let t0 = performance.now();
  for (let i = 0; i < N; i++) {
    db.transaction(() =>
      repo.append({
        dayId: 'd1',
        at: now + i,
        actor: { userId: 'u1', name: 'B' },
        deviceId: 'bench-device',
        type: 'timer.done',
        payload,
      }),
    );
  }
  const jardayPerSec = N / ((performance.now() - t0) / 1000);

  const raw = new Database(join(dir, 'jarday.sqlite'));
  raw.pragma('journal_mode = WAL');
  raw.pragma('synchronous = NORMAL');
  const insert = raw.prepare(
    'insert into journal (day_id, seq, at, actor_id, actor_name, device_id, type, payload) values (?, ?, ?, ?, ?, ?, ?, ?)',
  );
  const one = raw.transaction((i: number) =>
    insert.run('d2', i + 1, now + i, 'u1', 'B', 'bench-device', 'timer.done', JSON.stringify(payload)),
  );
  t0 = performance.now();
  for (let i = 0; i < N; i++) one(i);
  const rawPerSec = N / ((performance.now() - t0) / 1000);
  raw.close();
  db.$client.close();
  return {
    'journal appends/s (Jarday: seq + row, 1 transaction each)': Math.round(jardayPerSec).toLocaleString('en-US'),
    'journal inserts/s (raw better-sqlite3, 1 transaction each)': Math.round(rawPerSec).toLocaleString('en-US'),
    'journal ratio Jarday / raw': `${(jardayPerSec / rawPerSec).toFixed(2)}x`,
  };
}
