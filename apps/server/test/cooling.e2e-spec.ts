import { randomUUID } from 'node:crypto';
import {
  type CoolingLoadView,
  type CoolingShelfView,
  type DayView,
  type ReprocessAnswer,
  rulesOf,
} from '@jarday/contracts';
import { bandGate, planProcess } from '@jarday/rules';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import {
  addLoad,
  errorOf,
  canningDay,
  entriesOf,
  HOUR,
  journalOf,
  liftLoad,
  MINUTE,
  receive,
} from './support/lifted-load.js';
import { connectLive, ok } from './support/live-client.js';
import { kitchenWithCrew, startTestApp, type TestApp } from './support/test-app.js';
import { boilingWaterCanner, ft, tomatoesInWater } from '../../../libs/rules/src/testing/published-recipes.js';

type Crew = Awaited<ReturnType<typeof kitchenWithCrew>>;

describe('the cooling shelf and the band gate (e2e: real server, real SQLite file, Date frozen)', () => {
  let t: TestApp;
  let crew: Crew;
  /** Tests move the clock from a moment well before the crew's tokens were issued, so none expires. */
  let lifted: Date;
  const at = (ms: number) => vi.setSystemTime(new Date(lifted.getTime() + ms));
  const base = () => `/api/kitchens/${crew.kitchen.id}`;

  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' }, true);
    crew = await kitchenWithCrew(t.http); // at 2,100 ft
    lifted = new Date(Date.now() - 30 * 24 * HOUR);
  });
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(lifted);
  });
  afterEach(() => vi.useRealTimers());
  afterAll(() => t.close());

  async function liftedLoad(opts: Parameters<typeof canningDay>[3] = {}) {
    const day = await canningDay(t.http, crew.kitchen.id, crew.lead, opts);
    const load = await addLoad(t.http, crew.kitchen.id, crew.lead, day);
    await liftLoad(t, crew.helper, day.dayId, load.id);
    return { day, load };
  }
  const bandsOff = (loadId: string, person = crew.helper, body: object = {}) =>
    request(t.http).post(`${base()}/loads/${loadId}/bands-off`).set(person.auth).send(body);
  const checkSeals = (loadId: string, jars: object[], person = crew.helper) =>
    request(t.http).put(`${base()}/loads/${loadId}/seal-checks`).set(person.auth).send({ jars });
  const allSealed = (n: number, except: number[] = []) =>
    Array.from({ length: n }, (_, i) => i + 1)
      .filter((j) => !except.includes(j))
      .map((jarNumber) => ({ jarNumber, result: 'sealed', outcome: 'store' }));

  describe('the band gate: 12 h after lifting (USDA Complete Guide to Home Canning, Guide 1: 12 to 24 hours)', () => {
    it('refuses at 11 h 59 min with the time to wait, journals the refusal, and allows at exactly 12 h', async () => {
      const { day, load } = await liftedLoad();
      const board = await connectLive(t.url, crew.lead.token);
      await ok(board, 'day:join', { dayId: day.dayId });

      at(11 * HOUR + 59 * MINUTE);
      const early = await bandsOff(load.id).expect(409);
      expect(early.body).toMatchObject({ code: 'bands_too_early', message: bandGate(lifted, new Date()).message });
      expect(errorOf(early).message).toContain('in 1 min');
      const refused = await receive(board, (e) => e.type === 'load.bands-refused');
      expect(refused).toMatchObject({
        actor: { userId: crew.helper.user.id, name: 'Helper' },
        payload: { loadId: load.id, reason: 'too-early', remainingMs: MINUTE },
      });

      at(12 * HOUR);
      const off = (await bandsOff(load.id).expect(200)).body as CoolingLoadView;
      expect(off).toMatchObject({ loadId: load.id, bandsOffAt: new Date().toISOString(), bandsOffOverride: null });
      const entry = await receive(board, (e) => e.type === 'load.bands-off');
      expect(entry.payload).toMatchObject({ loadId: load.id, early: false, override: null });
      board.disconnect();

      // A second tap finds the bands off: the same answer, and still one entry in the journal.
      at(12 * HOUR + 5 * MINUTE);
      expect((await bandsOff(load.id).expect(200)).body).toEqual(off);
      const journal = await journalOf(t, crew.watcher, day.dayId);
      expect(entriesOf(journal, 'load.bands-off')).toHaveLength(1);
      expect(entriesOf(journal, 'load.bands-refused')).toHaveLength(1);
    });

    it('a helper cannot override the gate; a lead can with a written reason, and the journal keeps both', async () => {
      const { day, load } = await liftedLoad();
      at(3 * HOUR);
      const reason = { override: { reason: 'Moving house tonight, jars must travel' } };
      const helper = await bandsOff(load.id, crew.helper, reason).expect(403);
      expect(errorOf(helper).message).toMatch(/only a lead/i);
      await bandsOff(load.id, crew.lead, { override: { reason: 'no' } }).expect(400);

      const lead = (await bandsOff(load.id, crew.lead, reason).expect(200)).body as CoolingLoadView;
      expect(lead.bandsOffOverride).toBe(reason.override.reason);
      expect(lead.bandsOffAt).toBe(new Date().toISOString());

      const journal = await journalOf(t, crew.lead, day.dayId);
      expect(entriesOf(journal, 'load.bands-refused').map((e) => e.payload)).toEqual([
        expect.objectContaining({ reason: 'override-needs-lead', overrideReason: reason.override.reason }),
      ]);
      expect(entriesOf(journal, 'load.bands-off')).toEqual([
        expect.objectContaining({
          actor: { userId: crew.lead.user.id, name: 'Lead' },
          payload: expect.objectContaining({
            early: true,
            override: reason.override.reason,
            remainingMs: 9 * HOUR,
          }) as unknown,
        }),
      ]);
    });

    it('a watcher cannot take bands off; a load still in the canner has no bands to take off', async () => {
      const { load } = await liftedLoad();
      at(13 * HOUR);
      await bandsOff(load.id, crew.watcher).expect(403);
      const day = await canningDay(t.http, crew.kitchen.id, crew.lead);
      const inCanner = await addLoad(t.http, crew.kitchen.id, crew.lead, day);
      expect(errorOf(await bandsOff(inCanner.id).expect(409)).code).toBe('not_lifted');
      await bandsOff(load.id, crew.outsider).expect(404);
      await request(t.http)
        .post(`/api/kitchens/${crew.otherKitchen.id}/loads/${load.id}/bands-off`)
        .set(crew.outsider.auth)
        .send({})
        .expect(404);
    });
  });

  describe('seal checks', () => {
    it('refuses before the bands are off, jar numbers beyond the load, and outcomes that do not fit', async () => {
      const { load } = await liftedLoad();
      at(12 * HOUR);
      expect(errorOf(await checkSeals(load.id, allSealed(6)).expect(409)).code).toBe('bands_on');
      await bandsOff(load.id).expect(200);

      const beyond = await checkSeals(load.id, [{ jarNumber: 7, result: 'sealed', outcome: 'store' }]).expect(400);
      expect(errorOf(beyond).issues).toEqual([{ path: 'jars.0.jarNumber', message: 'Load 1 has jars 1 to 6' }]);
      const mismatch = await checkSeals(load.id, [{ jarNumber: 1, result: 'sealed', outcome: 'fridge' }]).expect(400);
      expect(errorOf(mismatch).issues).toEqual([{ path: 'jars.0.outcome', message: 'A sealed jar can go to: store' }]);
      await checkSeals(load.id, [{ jarNumber: 2, result: 'broken', outcome: 'store' }]).expect(400);
      await checkSeals(load.id, [...allSealed(1), ...allSealed(1)]).expect(400);
      await checkSeals(load.id, [{ jarNumber: 0, result: 'sealed', outcome: 'store' }]).expect(400);
      await checkSeals(load.id, allSealed(6), crew.watcher).expect(403);
      // Nothing of the refused checks was kept.
      const shelf = (await request(t.http).get(`${base()}/cooling`).set(crew.watcher.auth).expect(200))
        .body as CoolingShelfView;
      expect(shelf.loads.find((l) => l.loadId === load.id)?.sealChecks).toEqual([]);
    });

    it("records the checks with a journal entry and its counts, makes the lot, and gives the day's seal rate", async () => {
      const { day, load } = await liftedLoad();
      at(13 * HOUR);
      await bandsOff(load.id).expect(200);
      const view = (
        await checkSeals(load.id, [
          ...allSealed(6, [4, 6]),
          { jarNumber: 4, result: 'unsealed', outcome: 'fridge' },
          { jarNumber: 6, result: 'broken', outcome: 'discard' },
        ]).expect(200)
      ).body as CoolingLoadView;
      expect(view.sealChecks.map((c) => [c.jarNumber, c.result])).toEqual([
        [1, 'sealed'],
        [2, 'sealed'],
        [3, 'sealed'],
        [4, 'unsealed'],
        [5, 'sealed'],
        [6, 'broken'],
      ]);
      expect(view.sealChecks[0]).toMatchObject({ byName: 'Helper', checkedAt: new Date().toISOString() });
      expect(view.lot?.code).toMatch(/^260815-A(-\d+)?$/);

      // A correction: jar 4 sealed after all when pressed again.
      await checkSeals(load.id, [{ jarNumber: 4, result: 'sealed', outcome: 'store' }]).expect(200);
      const journal = await journalOf(t, crew.watcher, day.dayId);
      const checks = entriesOf(journal, 'load.seal-checked');
      expect(checks.map((e) => e.payload)).toEqual([
        expect.objectContaining({
          counts: { sealed: 4, unsealed: 1, broken: 1 },
          load: { jars: 6, checked: 6, sealed: 4 },
        }),
        expect.objectContaining({
          counts: { sealed: 1, unsealed: 0, broken: 0 },
          load: { jars: 6, checked: 6, sealed: 5 },
        }),
      ]);
      expect(entriesOf(journal, 'lot.created')).toHaveLength(1);

      const shelf = (
        await request(t.http).get(`${base()}/cooling`).query({ dayId: day.dayId }).set(crew.watcher.auth).expect(200)
      ).body as CoolingShelfView;
      expect(shelf.days).toEqual([
        expect.objectContaining({ dayId: day.dayId, sealRate: { checked: 6, sealed: 5, rate: 5 / 6 } }),
      ]);
    });
  });

  describe('reprocessing within 24 h, with a new lid and the full time (USDA Guide 1, 1994)', () => {
    it('opens a load linked to the first, with the full tested time and its own process timer', async () => {
      // Whole tomatoes in water, pints, hot pack, at 2,100 ft: 45 min (USDA Guide 3; NCHFP).
      const { day, load } = await liftedLoad({ starter: 'starter-tomatoes-in-water', jarSize: 'pint', pack: 'hot' });
      expect(load.plan.minutes).toBe(45);
      at(12 * HOUR);
      await bandsOff(load.id).expect(200);
      at(14 * HOUR);
      await checkSeals(load.id, [
        ...allSealed(6, [2, 5]),
        { jarNumber: 2, result: 'unsealed', outcome: 'reprocess' },
        { jarNumber: 5, result: 'unsealed', outcome: 'reprocess' },
      ]).expect(200);

      const answer = (
        await request(t.http)
          .post(`${base()}/loads/${load.id}/reprocess`)
          .set(crew.helper.auth)
          .send({ cannerId: day.cannerId })
          .expect(201)
      ).body as ReprocessAnswer;
      expect(answer).toMatchObject({ jarNumbers: [2, 5], dayReopened: false });
      expect(answer.load).toMatchObject({ batchId: load.batchId, number: 2, jars: 2, liftedAt: null });
      expect(answer.load.plan).toEqual(load.plan);
      // The full time, as the rules give it for the stored recipe in this canner at the day's altitude...
      const canner = {
        method: 'boiling-water' as const,
        gauge: null,
        capacity: { 'half-pint': 12, pint: 9, quart: 7 },
      };
      const ruled = planProcess({
        recipe: rulesOf(day.recipe),
        jarSize: 'pint',
        pack: 'hot',
        altitude: ft(2100),
        canner,
      });
      expect(ruled.ok && ruled.plan).toEqual(answer.load.plan);
      // ...and as the published table has it: USDA Guide 3, pints, 1,001-3,000 ft, 45 minutes (NCHFP, confirmed).
      const published = planProcess({
        recipe: tomatoesInWater,
        jarSize: 'pint',
        pack: 'hot',
        altitude: ft(2100),
        canner: boilingWaterCanner,
      });
      expect(published.ok && published.plan.minutes).toBe(answer.load.plan.minutes);
      expect(answer.original.reprocessedBy).toBe(answer.load.id);

      const joined = await journalOf(t, crew.helper, day.dayId);
      const timer = joined.snapshot.timers.find((x) => x.loadId === answer.load.id);
      expect(timer).toMatchObject({ kind: 'process', state: 'armed', durationMs: 45 * MINUTE, minimumMs: 45 * MINUTE });
      expect(entriesOf(joined, 'load.created').at(-1)?.payload).toMatchObject({
        reprocessOf: { loadId: load.id, number: 1 },
      });
      expect(entriesOf(joined, 'load.reprocess-opened').map((e) => e.payload)).toEqual([
        expect.objectContaining({ loadId: load.id, newLoadId: answer.load.id, jarNumbers: [2, 5], minutes: 45 }),
      ]);
      const shelf = (await request(t.http).get(`${base()}/cooling`).query({ dayId: day.dayId }).set(crew.lead.auth))
        .body as CoolingShelfView;
      expect(shelf.loads.find((l) => l.loadId === load.id)?.reprocessedBy).toBe(answer.load.id);
    });

    it('refuses a second reprocessing and settles which jars went back in', async () => {
      const { day, load } = await liftedLoad();
      at(12 * HOUR);
      await bandsOff(load.id).expect(200);
      const reprocess = () =>
        request(t.http)
          .post(`${base()}/loads/${load.id}/reprocess`)
          .set(crew.helper.auth)
          .send({ cannerId: day.cannerId });
      expect(errorOf(await reprocess().expect(409)).code).toBe('nothing_to_reprocess');
      await checkSeals(load.id, [{ jarNumber: 3, result: 'unsealed', outcome: 'reprocess' }]).expect(200);
      await request(t.http)
        .post(`${base()}/loads/${load.id}/reprocess`)
        .set(crew.watcher.auth)
        .send({ cannerId: day.cannerId })
        .expect(403);
      await reprocess().expect(201);
      expect(errorOf(await reprocess().expect(409)).message).toMatch(/already went back in as load 2/);
      const moved = await checkSeals(load.id, [{ jarNumber: 3, result: 'unsealed', outcome: 'fridge' }]).expect(409);
      expect(errorOf(moved).message).toMatch(/record its seal there/);
      const late = await checkSeals(load.id, [{ jarNumber: 4, result: 'unsealed', outcome: 'reprocess' }]).expect(409);
      expect(errorOf(late).message).toMatch(/fridge/);
    });

    it('after 24 h it is refused with word to refrigerate, and no jar can newly be marked for it', async () => {
      const { day, load } = await liftedLoad();
      at(12 * HOUR);
      await bandsOff(load.id).expect(200);
      at(23 * HOUR);
      await checkSeals(load.id, [{ jarNumber: 1, result: 'unsealed', outcome: 'reprocess' }]).expect(200);
      at(24 * HOUR);
      const closed = await request(t.http)
        .post(`${base()}/loads/${load.id}/reprocess`)
        .set(crew.lead.auth)
        .send({ cannerId: day.cannerId })
        .expect(409);
      expect(closed.body).toMatchObject({ code: 'reprocess_closed' });
      expect(errorOf(closed).message).toBe(
        'The 24 hours to reprocess load 1 have just run out: refrigerate its unsealed jars and eat them within a few days.',
      );
      const marked = await checkSeals(load.id, [{ jarNumber: 2, result: 'unsealed', outcome: 'reprocess' }]).expect(
        409,
      );
      expect(errorOf(marked).code).toBe('reprocess_closed');
      await checkSeals(load.id, [{ jarNumber: 2, result: 'unsealed', outcome: 'fridge' }]).expect(200);
    });

    it('works on a closed day: bands and checks tomorrow, and reprocessing reopens the day for its timer', async () => {
      const { day, load } = await liftedLoad();
      at(HOUR);
      await request(t.http).post(`${base()}/days/${day.dayId}/close`).set(crew.lead.auth).expect(200);
      at(12 * HOUR);
      await bandsOff(load.id).expect(200);
      await checkSeals(load.id, [...allSealed(5), { jarNumber: 6, result: 'unsealed', outcome: 'reprocess' }]).expect(
        200,
      );
      const answer = (
        await request(t.http)
          .post(`${base()}/loads/${load.id}/reprocess`)
          .set(crew.helper.auth)
          .send({ cannerId: day.cannerId })
          .expect(201)
      ).body as ReprocessAnswer;
      expect(answer.dayReopened).toBe(true);
      const view = (await request(t.http).get(`${base()}/days/${day.dayId}`).set(crew.lead.auth)).body as DayView;
      expect(view).toMatchObject({ status: 'open', closedAt: null });

      const device = await connectLive(t.url, crew.helper.token);
      const joined = await ok<{ snapshot: { timers: { id: string; loadId?: string }[] }; missed: { type: string }[] }>(
        device,
        'day:join',
        { dayId: day.dayId, sinceSeq: 0 },
      );
      const types = joined.missed.map((e) => e.type);
      expect(types.slice(types.indexOf('day.closed'))).toEqual([
        'day.closed',
        'load.bands-off',
        'load.seal-checked',
        'lot.created',
        'day.reopened',
        'load.created',
        'timer.created',
        'load.reprocess-opened',
      ]);
      const timer = joined.snapshot.timers.find((x) => x.loadId === answer.load.id)!;
      const heating = await ok<{ timer: { state: string } }>(device, 'timer:command', {
        commandId: randomUUID(),
        dayId: day.dayId,
        timerId: timer.id,
        command: { type: 'water-heating' },
      });
      expect(heating.timer.state).toBe('waiting-for-boil');
      device.disconnect();
    });
  });

  describe('the shelf view', () => {
    it('shows lifted loads with their times; finished ones leave after 3 days, unfinished ones stay', async () => {
      const finished = await liftedLoad();
      const unfinished = await liftedLoad();
      const inCanner = await addLoad(
        t.http,
        crew.kitchen.id,
        crew.lead,
        await canningDay(t.http, crew.kitchen.id, crew.lead),
      );
      at(12 * HOUR);
      await bandsOff(finished.load.id).expect(200);
      await checkSeals(finished.load.id, allSealed(6)).expect(200);

      const shelf = (await request(t.http).get(`${base()}/cooling`).set(crew.watcher.auth).expect(200))
        .body as CoolingShelfView;
      expect(shelf.serverTime).toBe(new Date().toISOString());
      const ids = shelf.loads.map((l) => l.loadId);
      expect(ids).toEqual(expect.arrayContaining([finished.load.id, unfinished.load.id]));
      expect(ids).not.toContain(inCanner.id);
      expect(shelf.loads.find((l) => l.loadId === unfinished.load.id)).toMatchObject({
        liftedAt: lifted.toISOString(),
        bandsEarliestAt: new Date(lifted.getTime() + 12 * HOUR).toISOString(),
        bandsRecommendedAt: new Date(lifted.getTime() + 24 * HOUR).toISOString(),
        reprocessDeadline: new Date(lifted.getTime() + 24 * HOUR).toISOString(),
        bandsOffAt: null,
        jars: 6,
        jarSize: 'half-pint',
        recipeName: expect.stringMatching(/jam/i) as string,
      });

      at(3 * 24 * HOUR + MINUTE);
      const later = (await request(t.http).get(`${base()}/cooling`).set(crew.lead.auth).expect(200))
        .body as CoolingShelfView;
      expect(later.loads.map((l) => l.loadId)).toContain(unfinished.load.id);
      expect(later.loads.map((l) => l.loadId)).not.toContain(finished.load.id);
      // Asked by its day, a finished load is always there.
      const ofDay = (
        await request(t.http).get(`${base()}/cooling`).query({ dayId: finished.day.dayId }).set(crew.lead.auth)
      ).body as CoolingShelfView;
      expect(ofDay.loads.map((l) => l.loadId)).toEqual([finished.load.id]);
      expect(ofDay.days[0]?.sealRate).toEqual({ checked: 6, sealed: 6, rate: 1 });

      await request(t.http).get(`${base()}/cooling`).query({ dayId: 'nope' }).set(crew.lead.auth).expect(400);
      await request(t.http).get(`${base()}/cooling`).set(crew.outsider.auth).expect(404);
      await request(t.http)
        .get(`/api/kitchens/${crew.otherKitchen.id}/cooling`)
        .query({ dayId: finished.day.dayId })
        .set(crew.outsider.auth)
        .expect(404);
    });
  });
});
