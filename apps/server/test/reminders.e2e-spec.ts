import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { DayView, LoadView, SessionView } from '@jarday/contracts';
import Database from 'better-sqlite3';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { MailCatcher } from '../src/mail/mail-catcher.js';
import { RemindersService } from '../src/reminders/reminders.service.js';
import { dayWithLoad } from './support/day-fixture.js';
import { connectLive, ok, waitForEvent } from './support/live-client.js';
import { freePort, startServerProcess, type ServerProcess } from './support/server-process.js';
import { kitchenWithCrew, startTestApp } from './support/test-app.js';

const HOUR = 3_600_000;

/** JSON over fetch against the server process. */
async function api<T>(base: string, path: string, token: string | null, body?: unknown, method = 'POST'): Promise<T> {
  const res = await fetch(base + path, {
    method: body === undefined ? 'GET' : method,
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${path}: ${res.status} ${await res.text()}`);
  return (await res.json()) as T;
}

/** Waits until `read` gives a value (a wait for the server's own work, never a timed assertion). */
async function until<T>(read: () => T | undefined, what: string, ms = 15_000): Promise<T> {
  const deadline = Date.now() + ms;
  for (;;) {
    const value = read();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`gave up waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

/** Lifts the loads out through the socket, as a device does: the cooling rest of a load is what lifts it. */
async function lift(url: string, token: string, dayId: string, loadIds: string[]): Promise<void> {
  const tablet = await connectLive(url, token);
  await ok(tablet, 'day:join', { dayId });
  for (const loadId of loadIds) {
    await ok(tablet, 'timer:start', {
      commandId: randomUUID(),
      dayId,
      timer: { kind: 'cooling-rest', label: 'Cooling', loadId, startNow: true },
    });
    await waitForEvent(tablet, (e) => e.type === 'load.lifted' && (e.payload as { load: LoadView }).load.id === loadId);
  }
  tablet.disconnect();
}

describe('a bands reminder across real restarts of the built server (process e2e)', { timeout: 90_000 }, () => {
  const dir = mkdtempSync(join(tmpdir(), 'jarday-reminders-'));
  const dbPath = join(dir, 'jarday.sqlite');
  let catcher: MailCatcher | undefined;
  let server: ServerProcess | undefined;
  afterAll(async () => {
    await server?.stop('SIGKILL');
    await catcher?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('is sent once to the leads and helpers who want it, and not again after a kill -9 and a restart', async () => {
    catcher = await MailCatcher.start();
    // An hour between looks: what is sent here is sent by the re-arming at start-up, not by a poll.
    const env = {
      DATABASE_PATH: dbPath,
      PORT: String(await freePort()),
      SMTP_URL: catcher.url,
      PUBLIC_URL: 'http://jarday.test',
      REMINDER_CHECK_SECONDS: '3600',
    };
    server = await startServerProcess(env);
    const base = server.url;
    const person = (email: string, name: string) =>
      api<SessionView>(base, '/api/auth/register', null, { email, name, password: 'a long enough password' });
    const lead = await person('lead@reminders.test', 'Rosa Lead');
    const helper = await person('helper@reminders.test', 'Tom Helper');
    const quiet = await person('quiet@reminders.test', 'Ana Quiet');
    const watcher = await person('watcher@reminders.test', 'Li Watcher');
    const k = (await api<{ id: string }>(base, '/api/kitchens', lead.accessToken, { name: 'Cellar kitchen' })).id;
    for (const [who, role] of [
      [helper, 'helper'],
      [quiet, 'helper'],
      [watcher, 'watcher'],
    ] as const) {
      const invite = await api<{ code: string }>(base, `/api/kitchens/${k}/invites`, lead.accessToken, { role });
      await api(base, `/api/invites/${invite.code}/redeem`, who.accessToken, {});
    }
    await api(base, `/api/kitchens/${k}/members/me`, quiet.accessToken, { reminders: false }, 'PATCH');

    const canner = await api<{ id: string }>(base, `/api/kitchens/${k}/canners`, lead.accessToken, {
      name: 'Bath',
      method: 'boiling-water',
      capacity: { 'half-pint': 12 },
    });
    const recipe = await api<{ id: string }>(base, `/api/kitchens/${k}/recipes/copy`, lead.accessToken, {
      recipeId: 'starter-hot-packed-jam',
    });
    const day = await api<DayView>(base, `/api/kitchens/${k}/days`, lead.accessToken, { date: '2026-09-01' });
    const batch = await api<{ id: string }>(base, `/api/kitchens/${k}/days/${day.id}/batches`, lead.accessToken, {
      recipeId: recipe.id,
      jarSize: 'half-pint',
      pack: 'hot',
      jars: 24,
    });
    const loads: LoadView[] = [];
    for (let i = 0; i < 3; i++) {
      loads.push(
        await api<LoadView>(base, `/api/kitchens/${k}/days/${day.id}/loads`, lead.accessToken, {
          batchId: batch.id,
          cannerId: canner.id,
          jars: 8,
        }),
      );
    }
    const [first, canary, crashed] = loads as [LoadView, LoadView, LoadView];
    await lift(base, lead.accessToken, day.id, [first.id, canary.id, crashed.id]);

    // The test's own handle on the database file: it only moves lifting 12 h back while the server is down,
    // and reads the reminders table.
    const sqlite = new Database(dbPath);
    const twelveHoursAgo = () => Date.now() - 12 * HOUR - 60_000;
    const setLifted = sqlite.prepare('update loads set lifted_at = ? where id = ?');
    const row = (loadId: string) =>
      sqlite.prepare('select * from reminders where load_id = ?').get(loadId) as
        { kind: string; sent_at: number | null; recipients: number; note: string | null } | undefined;

    await server.stop('SIGKILL');
    setLifted.run(twelveHoursAgo(), first.id);
    setLifted.run(twelveHoursAgo(), crashed.id);
    // What a crash between the claim and the send leaves: a claimed row, never settled.
    sqlite
      .prepare(
        `insert into reminders (id, kitchen_id, load_id, kind, due_at, claimed_at, recipients) values (?, ?, ?, 'bands-ready', ?, ?, 0)`,
      )
      .run(randomUUID(), k, crashed.id, Date.now(), Date.now());
    server = await startServerProcess(env);

    const subject = (n: number) => `Cellar kitchen: bands may come off load ${n}`;
    for (const to of ['lead@reminders.test', 'helper@reminders.test']) {
      const mail = await catcher.waitFor((m) => m.to.includes(to) && m.subject === subject(first.number));
      expect(mail.text).toContain(`Load ${first.number} (Hot-packed jam, 2026-09-01) came out of the canner at`);
      expect(mail.links).toEqual([`http://jarday.test/kitchens/${k}/cooling?day=${day.id}`]);
    }
    const settled = await until(() => {
      const r = row(first.id);
      return r?.sent_at ? r : undefined;
    }, 'the reminder row to be settled');
    expect(settled).toMatchObject({ kind: 'bands-ready', recipients: 2, note: null });
    expect(server.output()).toContain('1 reminder(s) were claimed but not sent before a stop');

    // Kill -9 and start again, with a second load now owed too: its mail shows the start-up check has run.
    await server.stop('SIGKILL');
    setLifted.run(twelveHoursAgo(), canary.id);
    server = await startServerProcess(env);
    await catcher.waitFor((m) => m.to.includes('helper@reminders.test') && m.subject === subject(canary.number));
    await catcher.waitFor((m) => m.to.includes('lead@reminders.test') && m.subject === subject(canary.number));
    // A clean stop waits for mail in flight, so after it the catcher holds everything this server sent.
    await server.stop('SIGTERM');
    sqlite.close();

    const caught = catcher.messages();
    const copies = (to: string, n: number) =>
      caught.filter((m) => m.to.includes(to) && m.subject === subject(n)).length;
    for (const to of ['lead@reminders.test', 'helper@reminders.test']) {
      expect(copies(to, first.number)).toBe(1);
      expect(copies(to, canary.number)).toBe(1);
      expect(copies(to, crashed.number)).toBe(0);
    }
    // Reminders off, and watchers: nothing.
    expect(
      caught.filter((m) => m.to.includes('quiet@reminders.test') || m.to.includes('watcher@reminders.test')),
    ).toEqual([]);
  });
});

describe('the reprocess reminder (in-process e2e)', () => {
  it('goes 22 h after lifting to members who want it when jars wait for reprocessing, once', async () => {
    const catcher = await MailCatcher.start();
    const t = await startTestApp({ SMTP_URL: catcher.url, PUBLIC_URL: 'http://jarday.test' }, true);
    try {
      const crew = await kitchenWithCrew(t.http);
      await request(t.http)
        .patch(`/api/kitchens/${crew.kitchen.id}/members/me`)
        .set(crew.helper.auth)
        .send({ reminders: false })
        .expect(200);
      const { day, load } = await dayWithLoad(t.http, crew.kitchen.id, crew.lead);
      await lift(t.url, crew.lead.token, day.id, [load.id]);

      // The seal check and the bands come from the cooling shelf; written straight into the test database here.
      const sqlite = new Database(join(t.dir, 'jarday.sqlite'));
      const lifted = Date.now() - 22 * HOUR - 60_000;
      sqlite.prepare('update loads set lifted_at = ?, bands_off_at = ? where id = ?').run(lifted, Date.now(), load.id);
      const check = sqlite.prepare(
        `insert into seal_checks (load_id, jar_number, day_id, result, outcome, checked_at, by_name) values (?, ?, ?, ?, ?, ?, 'Lead')`,
      );
      check.run(load.id, 1, day.id, 'unsealed', 'reprocess', Date.now());
      check.run(load.id, 2, day.id, 'sealed', 'store', Date.now());
      sqlite.close();

      const reminders = t.app.get(RemindersService);
      reminders.check();
      const mail = await catcher.waitFor((m) => m.to.includes(crew.lead.user.email));
      expect(mail.subject).toBe('Test kitchen: 2 hours left to reprocess load 1');
      expect(mail.text).toContain(`until ${new Date(lifted + 24 * HOUR).toUTCString()}`);
      expect(mail.text).toContain('Use a new lid and the full process time.');
      await reminders.idle();

      reminders.check();
      await reminders.idle();
      // The lead only: the helper turned reminders off, watchers are not reminded, bands were off already.
      expect(catcher.messages().map((m) => [m.to, m.subject])).toEqual([
        [[crew.lead.user.email], 'Test kitchen: 2 hours left to reprocess load 1'],
      ]);
    } finally {
      await t.close();
      await catcher.close();
    }
  });
});
