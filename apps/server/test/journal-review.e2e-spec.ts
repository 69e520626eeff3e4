import { randomUUID } from 'node:crypto';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import type { DayReviewView, DayView, JournalView, PastDayView, TimerAnswer, YesterdayView } from '@jarday/contracts';
import { parse } from 'csv-parse/sync';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Db } from '../src/db/database.js';
import { DB } from '../src/db/database.module.js';
import { sealChecks } from '../src/db/schema/index.js';
import { TimersService } from '../src/timers/timers.service.js';
import { dayWithLoad } from './support/day-fixture.js';
import { command, connectLive, type LiveClient, ok, waitForEvent } from './support/live-client.js';
import { kitchenWithCrew, startTestApp, type TestApp } from './support/test-app.js';

const MIN = 60_000;
/** A reason with a comma, a double quote and a line break: the CSV must quote it per RFC 4180 and read back whole. */
const REASON = 'Smoke, "alarm" at the stove\nlifted early';
/** pdfjs reads the 14 standard PDF fonts' metrics from its own folder. */
const FONTS = join(dirname(createRequire(import.meta.url).resolve('pdfjs-dist/package.json')), 'standard_fonts/');
const T0 = new Date('2026-08-15T08:00:00.000Z').getTime();

async function pdfText(bytes: Buffer): Promise<string> {
  const pdf = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false, standardFontDataUrl: FONTS })
    .promise;
  const pages: string[] = [];
  for (let i = 1; i <= pdf.numPages; i += 1) {
    const content = await (await pdf.getPage(i)).getTextContent();
    pages.push(content.items.map((item) => ('str' in item ? item.str : '')).join(' '));
  }
  return pages.join('\n');
}

describe('the Journal: review, summary and exports of a day driven through the API and real sockets (e2e)', () => {
  let t: TestApp;
  let crew: Awaited<ReturnType<typeof kitchenWithCrew>>;
  let day: DayView;
  let loadId: string;
  const clients: LiveClient[] = [];
  const base = () => `/api/kitchens/${crew.kitchen.id}/days/${day.id}`;
  const at = (ms: number) => vi.setSystemTime(new Date(T0 + ms));

  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000', ACCESS_TOKEN_TTL_SECONDS: '86400' }, true);
    crew = await kitchenWithCrew(t.http); // at 2,100 ft
    const made = await dayWithLoad(t.http, crew.kitchen.id, crew.lead); // hot-packed jam, 6 half-pints, 10 min
    day = made.day;
    loadId = made.load.id;
    const tablet = await connectLive(t.url, crew.lead.token, 'tablet-lead-01');
    const phone = await connectLive(t.url, crew.helper.token, 'phone-helper-01');
    clients.push(tablet, phone);
    const joined = await ok<{ snapshot: { timers: { id: string; loadId: string | null }[] } }>(tablet, 'day:join', {
      dayId: day.id,
    });
    await ok(phone, 'day:join', { dayId: day.id });
    // The clock is ours from here: the server reads it for every command, firing and journal entry.
    vi.useFakeTimers({ toFake: ['Date'] });
    const process = joined.snapshot.timers.find((x) => x.loadId === loadId)!.id;
    const timers = t.app.get(TimersService);

    at(1 * MIN);
    await ok(phone, 'timer:command', command(day.id, process, { type: 'water-heating' }));
    at(31 * MIN); // a 30-minute come-up
    await ok(phone, 'timer:command', command(day.id, process, { type: 'rolling-boil' }));
    at(34 * MIN);
    await ok(tablet, 'timer:command', command(day.id, process, { type: 'boil-lost' }));
    at(36 * MIN);
    await ok(phone, 'timer:command', command(day.id, process, { type: 'rolling-boil' }));
    at(46 * MIN);
    timers.fire(process); // the server's own timeout at the deadline
    at(46 * MIN + 25_000);
    await ok(phone, 'timer:command', command(day.id, process, { type: 'acknowledge' }));
    at(47 * MIN);
    const rest = await ok<TimerAnswer>(tablet, 'timer:start', {
      commandId: randomUUID(),
      dayId: day.id,
      timer: {
        kind: 'canner-rest',
        label: 'Load 1: rest',
        loadId,
        startNow: true,
        durationMs: 2 * MIN,
        override: { reason: REASON },
      },
    });
    at(49 * MIN);
    timers.fire(rest.timer.id);
    at(49 * MIN + 40_000);
    await ok(phone, 'timer:command', command(day.id, rest.timer.id, { type: 'acknowledge' }));
    at(50 * MIN);
    await ok(phone, 'timer:start', {
      commandId: randomUUID(),
      dayId: day.id,
      timer: { kind: 'cooling-rest', label: 'Load 1: cooling shelf', loadId, startNow: true },
    });
    await waitForEvent(tablet, (e) => e.type === 'load.lifted');
    at(60 * MIN);
    await request(t.http).post(`${base()}/close`).set(crew.lead.auth).expect(200);
    // The seal checks of the next day, as the cooling shelf stores them: 5 of 6 sealed.
    const db = t.app.get<symbol, Db>(DB);
    for (let jar = 1; jar <= 6; jar += 1) {
      db.insert(sealChecks)
        .values({
          loadId,
          jarNumber: jar,
          dayId: day.id,
          result: jar === 6 ? 'unsealed' : 'sealed',
          outcome: jar === 6 ? 'fridge' : 'store',
          checkedAt: new Date(T0 + 25 * 60 * MIN),
          byUserId: crew.helper.user.id,
          byName: 'Helper',
        })
        .run();
    }
  });
  afterAll(async () => {
    for (const c of clients) c.disconnect();
    await t.close();
    vi.useRealTimers();
  });

  it('lists the day in time order with who, which device and plain words', async () => {
    const view = (await request(t.http).get(`${base()}/journal`).set(crew.lead.auth).expect(200)).body as JournalView;
    expect(view.total).toBe(view.entries.length);
    expect(view.entries.map((e) => e.seq)).toEqual(view.entries.map((_, i) => i + 1));
    const boil = view.entries.find((e) => e.type === 'timer.boil-confirmed')!;
    expect(boil).toMatchObject({
      actor: { name: 'Helper' },
      deviceId: 'phone-helper-01',
      loadNumber: 1,
      kind: 'timer',
    });
    expect(boil.text).toContain('Full rolling boil confirmed');
    expect(view.entries.find((e) => e.type === 'timer.done')).toMatchObject({ actor: null, deviceId: null });
    expect(view.loads).toEqual([{ id: loadId, number: 1, label: 'Load 1: Hot-packed jam' }]);
    expect(view.stations.map((s) => s.label)).toEqual(['The day', 'Water bath', 'Cooling shelf']);
  });

  it('filters by load, kind and station, and refuses a bad filter with 400', async () => {
    const get = (q: string) => request(t.http).get(`${base()}/journal?${q}`).set(crew.helper.auth);
    const alarms = (await get('kind=alarm').expect(200)).body as JournalView;
    expect(alarms.entries.map((e) => e.type)).toEqual([
      'alarm.raised',
      'alarm.acknowledged',
      'alarm.raised',
      'alarm.acknowledged',
    ]);
    const overrides = (await get(`kind=override&loadId=${loadId}`).expect(200)).body as JournalView;
    expect(overrides.entries).toHaveLength(1);
    const cooling = (await get('station=cooling').expect(200)).body as JournalView;
    expect(cooling.entries.map((e) => e.type)).toEqual(['timer.created', 'timer.started']);
    const none = (await get(`loadId=${randomUUID()}`).expect(200)).body as JournalView;
    expect(none.entries).toEqual([]);
    const bad = await get('kind=everything&station=attic').expect(400);
    expect((bad.body as { issues: { path: string }[] }).issues.map((i) => i.path).sort()).toEqual(['kind', 'station']);
    await get('colour=red').expect(400);
  });

  it('sums up the day: loads, jars by size, seal rate, come-up, alarm rings (ack - raised) and the override', async () => {
    const view = (await request(t.http).get(`${base()}/summary`).set(crew.lead.auth).expect(200)).body as DayReviewView;
    const s = view.summary;
    expect(s.loadsProcessed).toBe(1);
    expect(s.jarsBySize).toEqual([{ jarSize: 'half-pint', jars: 6, loads: 1 }]);
    expect(s.seals).toEqual({ checked: 6, sealed: 5, rate: 5 / 6 });
    expect(s.loads[0]).toMatchObject({ comeUpMs: 30 * MIN, boilLosses: 1, minutes: 10 });
    expect(s.alarms.map((a) => [a.ringMs, a.acknowledgedBy])).toEqual([
      [25_000, 'Helper'],
      [40_000, 'Helper'],
    ]);
    expect(s.overrides).toEqual([
      expect.objectContaining({
        byName: 'Lead',
        reason: REASON,
        what: 'Load 1: rest: 2 min instead of at least 5 min',
      }),
    ]);
    expect(view.until).toBe(T0 + 60 * MIN);
    expect(view.lanes.map((l) => l.label)).toEqual(['Water bath', 'Cooling shelf', 'Load 1']);
  });

  it('exports CSV per RFC 4180 that csv-parse reads back as the journal rows, the awkward reason included', async () => {
    const res = await request(t.http).get(`${base()}/journal.csv`).set(crew.watcher.auth).buffer(true).expect(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toContain(`jarday-${day.date}-journal.csv`);
    const text = res.text;
    expect(text.split('\r\n')[0]).toBe('seq,at,actor,device,kind,station,load,detail');
    const rows: string[][] = parse(text, { record_delimiter: '\r\n' });
    const view = (await request(t.http).get(`${base()}/journal`).set(crew.lead.auth).expect(200)).body as JournalView;
    expect(rows.slice(1)).toEqual(
      view.entries.map((e) => [
        String(e.seq),
        e.at,
        e.actor?.name ?? 'Jarday',
        e.deviceId ?? '',
        e.type,
        e.stationLabel,
        e.loadNumber === null ? '' : String(e.loadNumber),
        e.text,
      ]),
    );
    const override = rows.find((r) => r[4] === 'timer.override')!;
    expect(override[7]).toContain(REASON);
    expect(text).toContain('""alarm""');
  });

  it('prints the day record as a PDF with the title, the loads and the override reason', async () => {
    const res = await request(t.http)
      .get(`${base()}/record.pdf`)
      .set(crew.watcher.auth)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const text = (await pdfText(res.body as Buffer)).replace(/\s+/g, ' ');
    expect(text).toContain('Test day');
    expect(text).toContain('2026-08-15');
    expect(text).toContain('2,100 ft');
    expect(text).toContain('Hot-packed jam (Water bath)');
    expect(text).toContain('Safety overrides (1)');
    expect(text).toContain('Smoke, "alarm" at the stove');
    expect(text).toContain('Seal rate: 83%');
  });

  it("yesterday is the latest closed day; the past-days list carries each day's figures", async () => {
    const kitchen = `/api/kitchens/${crew.kitchen.id}`;
    const y = (await request(t.http).get(`${kitchen}/journal/yesterday`).set(crew.watcher.auth).expect(200))
      .body as YesterdayView;
    expect(y.day).toMatchObject({
      id: day.id,
      batchCount: 1,
      loadCount: 1,
      loadsProcessed: 1,
      jarsProcessed: 6,
      overrides: 1,
    });
    const days = (await request(t.http).get(`${kitchen}/journal/days?limit=5`).set(crew.helper.auth).expect(200))
      .body as PastDayView[];
    expect(days.find((d) => d.id === day.id)).toMatchObject({
      seals: { checked: 6, sealed: 5 },
      jarsBySize: [{ jarSize: 'half-pint', jars: 6 }],
    });
    await request(t.http).get(`${kitchen}/journal/days?limit=0`).set(crew.helper.auth).expect(400);
  });

  it('is closed to other kitchens (404) and to people signed out (401)', async () => {
    await request(t.http).get(`${base()}/journal`).set(crew.outsider.auth).expect(404);
    await request(t.http).get(`${base()}/record.pdf`).set(crew.outsider.auth).expect(404);
    await request(t.http)
      .get(`/api/kitchens/${crew.otherKitchen.id}/days/${day.id}/summary`)
      .set(crew.outsider.auth)
      .expect(404);
    await request(t.http).get(`${base()}/journal.csv`).expect(401);
  });
});
