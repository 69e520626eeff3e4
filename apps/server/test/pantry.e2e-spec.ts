import { join } from 'node:path';
import type { LotEntryAnswer, LotView, PantrySummaryView, ReprocessAnswer } from '@jarday/contracts';
import { bestQualityDate, CAUTIONS } from '@jarday/rules';
import Database from 'better-sqlite3';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { addLoad, errorOf, canningDay, type CanningDay, HOUR, liftLoad } from './support/lifted-load.js';
import { kitchenWithCrew, type Person, startTestApp, type TestApp } from './support/test-app.js';

type Crew = Awaited<ReturnType<typeof kitchenWithCrew>>;

describe('the pantry (e2e: real server, real SQLite file, Date frozen for the lifting)', () => {
  let t: TestApp;
  let crew: Crew;
  let lifted: Date;
  const at = (ms: number) => vi.setSystemTime(new Date(lifted.getTime() + ms));
  const base = () => `/api/kitchens/${crew.kitchen.id}`;

  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' }, true);
    crew = await kitchenWithCrew(t.http);
    lifted = new Date(Date.now() - 30 * 24 * HOUR);
  });
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(lifted);
  });
  afterEach(() => vi.useRealTimers());
  afterAll(() => t.close());

  const sealed = (from: number, to: number) =>
    Array.from({ length: to - from + 1 }, (_, i) => ({ jarNumber: from + i, result: 'sealed', outcome: 'store' }));

  /** A load of the day's batch, lifted, bands off at 12 h and its seals checked. */
  async function checkedLoad(day: CanningDay, jars: object[], batchIndex = 0) {
    at(0);
    const load = await addLoad(t.http, crew.kitchen.id, crew.lead, day, batchIndex);
    await liftLoad(t, crew.helper, day.dayId, load.id);
    at(12 * HOUR);
    await request(t.http).post(`${base()}/loads/${load.id}/bands-off`).set(crew.helper.auth).send({}).expect(200);
    await request(t.http)
      .put(`${base()}/loads/${load.id}/seal-checks`)
      .set(crew.helper.auth)
      .send({ jars })
      .expect(200);
    return load;
  }
  const lotOfBatch = async (batchId: string, person: Person = crew.watcher) => {
    const lots = (await request(t.http).get(`${base()}/lots`).set(person.auth).expect(200)).body as LotView[];
    return lots.find((l) => l.batchId === batchId)!;
  };
  const addEntry = (lotId: string, body: object, person: Person = crew.helper) =>
    request(t.http).post(`${base()}/lots/${lotId}/entries`).set(person.auth).send(body);

  it('makes the lot with the first seal check: code from the date and batch letter, best by 12 months on', async () => {
    const day = await canningDay(t.http, crew.kitchen.id, crew.lead, { date: '2026-09-03', batches: 2 });
    await checkedLoad(day, sealed(1, 6), 1);
    const lot = await lotOfBatch(day.batches[1]!.id);
    // Use within one year for best quality (extension guidance; USDA 2015 wording from memory).
    expect(lot).toMatchObject({
      code: '260903-B',
      dayId: day.dayId,
      dayDate: '2026-09-03',
      bestBy: '2027-09-03',
      jarSize: 'half-pint',
      sealed: 6,
      onShelf: 6,
      flaggedAt: null,
      location: null,
    });
    expect(lot.bestBy).toBe(bestQualityDate('2026-09-03'));
    // The first batch has no lot until one of its loads is checked.
    expect(await lotOfBatch(day.batches[0]!.id)).toBeUndefined();

    // A second day on the same date: its codes stay unique within the kitchen.
    const again = await canningDay(t.http, crew.kitchen.id, crew.lead, { date: '2026-09-03', batches: 2 });
    await checkedLoad(again, sealed(1, 2), 1);
    expect((await lotOfBatch(again.batches[1]!.id)).code).toBe('260903-B-2');

    // The token a QR code carries is long, random, URL-safe, and not the id.
    const db = new Database(join(t.dir, 'jarday.sqlite'), { readonly: true });
    const row = db.prepare('select public_token as token from lots where id = ?').get(lot.id) as { token: string };
    db.close();
    expect(row.token).toMatch(/^[A-Za-z0-9_-]{16,}$/);
    expect(row.token).not.toContain(lot.id);
  });

  it('counts reprocessed jars as sealed once their second check seals them', async () => {
    const day = await canningDay(t.http, crew.kitchen.id, crew.lead, { date: '2026-09-04' });
    const first = await checkedLoad(day, [...sealed(1, 4), { jarNumber: 5, result: 'unsealed', outcome: 'reprocess' }]);
    expect((await lotOfBatch(day.batches[0]!.id)).sealed).toBe(4);
    at(13 * HOUR);
    const again = (
      await request(t.http)
        .post(`${base()}/loads/${first.id}/reprocess`)
        .set(crew.helper.auth)
        .send({ cannerId: day.cannerId })
        .expect(201)
    ).body as ReprocessAnswer;
    const secondLift = new Date(lifted.getTime() + 14 * HOUR);
    vi.setSystemTime(secondLift);
    await liftLoad(t, crew.helper, day.dayId, again.load.id);
    vi.setSystemTime(new Date(secondLift.getTime() + 12 * HOUR));
    await request(t.http).post(`${base()}/loads/${again.load.id}/bands-off`).set(crew.helper.auth).send({}).expect(200);
    await request(t.http)
      .put(`${base()}/loads/${again.load.id}/seal-checks`)
      .set(crew.helper.auth)
      .send({ jars: sealed(1, 1) })
      .expect(200);
    expect((await lotOfBatch(day.batches[0]!.id)).sealed).toBe(5);
  });

  it('gifts and jars eaten leave the shelf; taking more than is there is refused', async () => {
    const day = await canningDay(t.http, crew.kitchen.id, crew.lead, { date: '2026-09-05' });
    await checkedLoad(day, [...sealed(1, 5), { jarNumber: 6, result: 'broken', outcome: 'discard' }]);
    const lot = await lotOfBatch(day.batches[0]!.id);
    expect(lot.onShelf).toBe(5);

    const gift = (
      await addEntry(lot.id, {
        kind: 'gift',
        jars: 2,
        recipient: 'The neighbours at no. 4',
        date: '2026-12-20',
      }).expect(201)
    ).body as LotEntryAnswer;
    expect(gift.entry).toMatchObject({ kind: 'gift', jars: 2, recipient: 'The neighbours at no. 4', byName: 'Helper' });
    expect(gift.lot).toMatchObject({ given: 2, onShelf: 3 });
    expect(gift.caution).toBeNull();
    const eaten = (await addEntry(lot.id, { kind: 'eaten', jars: 1, date: '2027-01-02' }, crew.lead).expect(201))
      .body as LotEntryAnswer;
    expect(eaten.lot).toMatchObject({ sealed: 5, eaten: 1, given: 2, onShelf: 2 });

    const over = await addEntry(lot.id, { kind: 'gift', jars: 3, recipient: 'Aunt', date: '2027-01-03' }).expect(422);
    expect(over.body).toMatchObject({
      code: 'not_enough_jars',
      message: expect.stringContaining('has 2 jars') as string,
    });
    expect(errorOf(await addEntry(lot.id, { kind: 'gift', jars: 1, date: '2027-01-03' }).expect(400)).issues).toEqual([
      { path: 'recipient', message: 'Who were the jars given to?' },
    ]);
    const early = await addEntry(lot.id, { kind: 'eaten', jars: 1, date: '2026-09-04' }).expect(400);
    expect(errorOf(early).issues).toEqual([{ path: 'date', message: 'On or after 2026-09-05' }]);
    await addEntry(lot.id, { kind: 'eaten', jars: 0, date: '2027-01-03' }).expect(400);

    const shown = (await request(t.http).get(`${base()}/lots/${lot.id}`).set(crew.watcher.auth).expect(200))
      .body as LotView;
    expect(shown.entries.map((e) => [e.kind, e.jars])).toEqual([
      ['eaten', 1],
      ['gift', 2],
    ]);
  });

  it('a spoilage report flags the lot and answers with the botulism caution and its source', async () => {
    const day = await canningDay(t.http, crew.kitchen.id, crew.lead, { date: '2026-09-06' });
    await checkedLoad(day, sealed(1, 6));
    const lot = await lotOfBatch(day.batches[0]!.id);
    at(20 * 24 * HOUR);
    const report = (
      await addEntry(lot.id, { kind: 'spoiled', jars: 1, date: '2026-11-01', note: 'Lid bulged' }).expect(201)
    ).body as LotEntryAnswer;
    expect(report.lot).toMatchObject({ spoiled: 1, onShelf: 5, flaggedAt: new Date().toISOString() });
    expect(report.caution).toEqual(CAUTIONS['spoiled-lot']);
    // USDA Complete Guide to Home Canning, Guide 1: do not taste; double-bag sealed suspect jars; boil the others.
    expect(report.caution?.text).toContain('Do not taste');
    expect(report.caution?.text).toContain('double-bagged');
    expect(report.caution?.text).toContain('boiling them 30 minutes in water 1 inch above the jars');
    expect(report.caution?.source).toContain('Identifying and handling spoiled canned food');

    // The lot stays flagged, and every later answer about it carries the caution.
    at(21 * 24 * HOUR);
    const later = (await addEntry(lot.id, { kind: 'eaten', jars: 1, date: '2026-11-02' }).expect(201))
      .body as LotEntryAnswer;
    expect(later.lot.flaggedAt).toBe(report.lot.flaggedAt);
    expect(later.caution?.id).toBe('spoiled-lot');
    const summary = (await request(t.http).get(`${base()}/pantry`).set(crew.watcher.auth).expect(200))
      .body as PantrySummaryView;
    expect(summary.flaggedLots).toBe(1);
  });

  it('sums the jars on the shelf by size across lots, and keeps where they are stored', async () => {
    const before = (await request(t.http).get(`${base()}/pantry`).set(crew.lead.auth).expect(200))
      .body as PantrySummaryView;
    const halfPints = await canningDay(t.http, crew.kitchen.id, crew.lead, { date: '2026-09-07' });
    await checkedLoad(halfPints, sealed(1, 6));
    const pints = await canningDay(t.http, crew.kitchen.id, crew.lead, {
      date: '2026-09-07',
      starter: 'starter-tomatoes-in-water',
      jarSize: 'pint',
    });
    await checkedLoad(pints, [...sealed(1, 5), { jarNumber: 6, result: 'unsealed', outcome: 'fridge' }]);
    const after = (await request(t.http).get(`${base()}/pantry`).set(crew.lead.auth).expect(200))
      .body as PantrySummaryView;
    const size = (s: PantrySummaryView, jarSize: string) => s.bySize.find((x) => x.jarSize === jarSize)?.onShelf ?? 0;
    expect(size(after, 'half-pint') - size(before, 'half-pint')).toBe(6);
    expect(size(after, 'pint') - size(before, 'pint')).toBe(5);
    expect(after.onShelf - before.onShelf).toBe(11);
    expect(after.lots - before.lots).toBe(2);
    const ofDay = (
      await request(t.http).get(`${base()}/lots`).query({ dayId: pints.dayId }).set(crew.lead.auth).expect(200)
    ).body as LotView[];
    expect(ofDay.map((l) => [l.jarSize, l.sealed])).toEqual([['pint', 5]]);

    const lot = ofDay[0]!;
    const moved = (
      await request(t.http)
        .patch(`${base()}/lots/${lot.id}`)
        .set(crew.helper.auth)
        .send({ location: 'Cellar, shelf 2' })
        .expect(200)
    ).body as LotView;
    expect(moved.location).toBe('Cellar, shelf 2');
    await request(t.http)
      .patch(`${base()}/lots/${lot.id}`)
      .set(crew.helper.auth)
      .send({ location: 'x'.repeat(81) })
      .expect(400);
    await request(t.http).patch(`${base()}/lots/${lot.id}`).set(crew.helper.auth).send({ shelf: 2 }).expect(400);
  });

  it('watchers read, helpers and leads record; other kitchens see nothing', async () => {
    const day = await canningDay(t.http, crew.kitchen.id, crew.lead, { date: '2026-09-08' });
    await checkedLoad(day, sealed(1, 6));
    const lot = await lotOfBatch(day.batches[0]!.id);
    const entry = { kind: 'eaten', jars: 1, date: '2026-10-01' };
    const patch = (p: Person) =>
      request(t.http).patch(`${base()}/lots/${lot.id}`).set(p.auth).send({ location: 'Hall' });

    for (const person of [crew.lead, crew.helper, crew.watcher]) {
      await request(t.http).get(`${base()}/lots`).set(person.auth).expect(200);
      await request(t.http).get(`${base()}/lots/${lot.id}`).set(person.auth).expect(200);
      await request(t.http).get(`${base()}/pantry`).set(person.auth).expect(200);
    }
    await patch(crew.watcher).expect(403);
    await addEntry(lot.id, entry, crew.watcher).expect(403);
    await patch(crew.helper).expect(200);
    await patch(crew.lead).expect(200);
    await addEntry(lot.id, entry, crew.helper).expect(201);
    await addEntry(lot.id, entry, crew.lead).expect(201);

    await request(t.http).get(`${base()}/lots`).set(crew.outsider.auth).expect(404);
    await request(t.http).get(`${base()}/lots/${lot.id}`).set(crew.outsider.auth).expect(404);
    await patch(crew.outsider).expect(404);
    await addEntry(lot.id, entry, crew.outsider).expect(404);
    // Through a kitchen of their own, the lot of another kitchen is not found either.
    const other = `/api/kitchens/${crew.otherKitchen.id}/lots/${lot.id}`;
    await request(t.http).get(other).set(crew.outsider.auth).expect(404);
    await request(t.http).post(`${other}/entries`).set(crew.outsider.auth).send(entry).expect(404);
    await request(t.http).get(`${base()}/lots/not-an-id`).set(crew.lead.auth).expect(400);
  });
});
