import type {
  CannerView,
  DayPlanView,
  DaySummaryView,
  DayView,
  PlanPreviewAnswer,
  RecipeView,
} from '@jarday/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { command, connectLive, type LiveClient, ok } from './support/live-client.js';
import { kitchenWithCrew, startTestApp, type TestApp } from './support/test-app.js';

const MIN = 60_000;
const T0 = Date.parse('2026-08-01T14:00:00.000Z');
const START = '2026-08-15T08:00:00.000Z';

describe('the Day planner: come-up estimates from the journal, previews and starting a day (e2e)', () => {
  let t: TestApp;
  let crew: Awaited<ReturnType<typeof kitchenWithCrew>>;
  let logged: CannerView; // has past loads in the journal
  let measured: CannerView; // water and burner given, no history
  let bare: CannerView; // neither
  let pressure: CannerView;
  let tomatoes: RecipeView;
  const clients: LiveClient[] = [];
  const api = (path: string) => `/api/kitchens/${crew.kitchen.id}${path}`;
  const addCanner = async (body: object) =>
    (await request(t.http).post(api('/canners')).set(crew.lead.auth).send(body).expect(201)).body as CannerView;
  const pints = (jars: number) => ({ recipeId: tomatoes.id, jarSize: 'pint', pack: 'hot', jars });
  const preview = async (cannerIds: string[], batches = [pints(18)]) =>
    (
      await request(t.http)
        .post(api('/plans/preview'))
        .set(crew.lead.auth)
        .send({ batches, cannerIds, startAt: START })
        .expect(200)
    ).body as PlanPreviewAnswer;
  const planned = (answer: PlanPreviewAnswer): DayPlanView => {
    if (!answer.ok) throw new Error(answer.reasons.map((r) => r.message).join('; '));
    return answer.plan;
  };

  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000', ACCESS_TOKEN_TTL_SECONDS: '86400' }, true);
    crew = await kitchenWithCrew(t.http); // at 2,100 ft
    logged = await addCanner({ name: 'Blue pot', method: 'boiling-water', capacity: { pint: 9, quart: 7 } });
    measured = await addCanner({
      name: 'Steel pot',
      method: 'boiling-water',
      capacity: { pint: 9 },
      waterLitres: 20,
      burnerWatts: 3000,
    });
    bare = await addCanner({ name: 'Old pot', method: 'boiling-water', capacity: { pint: 8 } });
    pressure = await addCanner({ name: 'Pressure', method: 'pressure', gauge: 'weighted', capacity: { pint: 9 } });
    tomatoes = (
      await request(t.http)
        .post(api('/recipes/copy'))
        .set(crew.lead.auth)
        .send({ recipeId: 'starter-tomatoes-in-water' })
        .expect(201)
    ).body as RecipeView;

    // History, made the way a kitchen makes it: a past day with three loads in the blue pot, driven through the
    // REST API and real sockets, the server's clock under the test's control.
    const day = (await request(t.http).post(api('/days')).set(crew.lead.auth).send({ date: '2026-08-01' }).expect(201))
      .body as DayView;
    const batch = (
      await request(t.http)
        .post(api(`/days/${day.id}/batches`))
        .set(crew.lead.auth)
        .send(pints(9))
        .expect(201)
    ).body as { id: string };
    const loadIds: string[] = [];
    for (let i = 0; i < 3; i += 1) {
      const load = await request(t.http)
        .post(api(`/days/${day.id}/loads`))
        .set(crew.lead.auth)
        .send({ batchId: batch.id, cannerId: logged.id, jars: 3 })
        .expect(201);
      loadIds.push((load.body as { id: string }).id);
    }
    const phone = await connectLive(t.url, crew.helper.token, 'phone-helper-01');
    clients.push(phone);
    const joined = await ok<{ snapshot: { timers: { id: string; loadId: string | null }[] } }>(phone, 'day:join', {
      dayId: day.id,
    });
    const timerOf = (loadId: string) => joined.snapshot.timers.find((x) => x.loadId === loadId)?.id ?? '';
    vi.useFakeTimers({ toFake: ['Date'] });
    const at = (ms: number) => vi.setSystemTime(new Date(T0 + ms));
    const comeUps = [22, 26, 24]; // minutes: the median is 24
    for (const [i, loadId] of loadIds.entries()) {
      const timer = timerOf(loadId);
      const lidOn = i * 120 * MIN;
      at(lidOn);
      await ok(phone, 'timer:command', command(day.id, timer, { type: 'water-heating' }));
      at(lidOn + (comeUps[i] ?? 0) * MIN);
      await ok(phone, 'timer:command', command(day.id, timer, { type: 'rolling-boil' }));
      if (i === 0) {
        // A lost boil found again later must not count as a second, longer come-up.
        at(lidOn + 30 * MIN);
        await ok(phone, 'timer:command', command(day.id, timer, { type: 'boil-lost' }));
        at(lidOn + 50 * MIN);
        await ok(phone, 'timer:command', command(day.id, timer, { type: 'rolling-boil' }));
      }
    }
    vi.useRealTimers();
  });

  afterAll(async () => {
    vi.useRealTimers();
    for (const c of clients) c.disconnect();
    await t.close();
  });

  it('learns the come-up from the canner’s logged loads: the median of 22, 26 and 24 min', async () => {
    const plan = planned(await preview([logged.id]));
    expect(plan.canners.map((c) => c.id)).toEqual([logged.id]);
    expect(plan.canners[0]?.comeUp).toMatchObject({ source: 'history', minutes: 24, samples: 3 });
    expect(plan.canners[0]?.comeUp.detail).toBe('learned from 3 logged loads: median 24 min');
    // 18 pints in a 9-pint canner: two loads of the starter's 45 min at 1,001-3,000 ft (USDA Guide 3, confirmed).
    expect(plan.loads.map((l) => [l.jars, l.plan.minutes])).toEqual([
      [9, 45],
      [9, 45],
    ]);
    // The water goes on one come-up before the first load's lid, and the boil follows one come-up after it.
    const lidOn = Date.parse(plan.loads[0]?.lidOnAt ?? '');
    expect(Date.parse(plan.heatingStartAt)).toBe(lidOn - 24 * MIN);
    expect(Date.parse(plan.loads[0]?.processStartAt ?? '')).toBe(lidOn + 24 * MIN);
    expect(Date.parse(plan.bandsOff.earliestAt)).toBe(Date.parse(plan.endAt) + 12 * 60 * MIN);
  });

  it('falls back to physics with water and burner, then to the published 20-30 min (USDA Guide 1)', async () => {
    const plan = planned(await preview([measured.id, bare.id]));
    const [steel, old] = plan.canners;
    expect(steel?.comeUp.source).toBe('physics');
    expect(steel?.comeUp.detail).toMatch(/^estimated from 20 L and 3,000 W/);
    expect(old?.comeUp).toMatchObject({ source: 'published', minutes: 30, range: { min: 20, max: 30 } });
    expect(new Set(plan.loads.map((l) => l.cannerId))).toEqual(new Set([measured.id, bare.id]));
  });

  it('stores water and burner on the canner, validated', async () => {
    const put = await request(t.http)
      .put(api(`/canners/${bare.id}`))
      .set(crew.lead.auth)
      .send({ name: 'Old pot', method: 'boiling-water', capacity: { pint: 8 }, waterLitres: 18.5, burnerWatts: 2400 })
      .expect(200);
    expect(put.body).toMatchObject({ waterLitres: 18.5, burnerWatts: 2400 });
    const bad = await request(t.http)
      .post(api('/canners'))
      .set(crew.lead.auth)
      .send({ name: 'X', method: 'boiling-water', capacity: { pint: 8 }, waterLitres: 0, burnerWatts: 99_000 })
      .expect(400);
    expect((bad.body as { issues: { path: string }[] }).issues.map((i) => i.path).sort()).toEqual([
      'burnerWatts',
      'waterLitres',
    ]);
    await request(t.http)
      .put(api(`/canners/${bare.id}`))
      .set(crew.lead.auth)
      .send({ name: 'Old pot', method: 'boiling-water', capacity: { pint: 8 } })
      .expect(200);
  });

  it('answers a plan the rules refuse with the reasons, and refuses to start it without creating a day', async () => {
    const answer = await preview([pressure.id]);
    expect(answer).toMatchObject({ ok: false, reasons: [{ code: 'method-mismatch', batchIndex: 0 }] });
    const before = (await request(t.http).get(api('/days')).set(crew.lead.auth).expect(200)).body as DaySummaryView[];
    const res = await request(t.http)
      .post(api('/plans/start'))
      .set(crew.lead.auth)
      .send({ batches: [pints(9)], cannerIds: [pressure.id], startAt: START, date: '2026-08-15' })
      .expect(422);
    expect(res.body).toMatchObject({ code: 'plan_refused' });
    const after = (await request(t.http).get(api('/days')).set(crew.lead.auth).expect(200)).body as DaySummaryView[];
    expect(after).toHaveLength(before.length);
  });

  it('starts the day: the day, its batch and the planned loads with their tested times', async () => {
    const body = {
      batches: [pints(18)],
      cannerIds: [logged.id],
      startAt: START,
      date: '2026-08-15',
      title: 'Tomatoes',
    };
    const res = await request(t.http).post(api('/plans/start')).set(crew.lead.auth).send(body).expect(201);
    const day = res.body as DayView;
    expect(day).toMatchObject({ title: 'Tomatoes', date: '2026-08-15', status: 'open' });
    expect(day.batches.map((b) => [b.recipeId, b.jarSize, b.jars])).toEqual([[tomatoes.id, 'pint', 18]]);
    expect(day.loads.map((l) => [l.number, l.cannerId, l.jars, l.plan.minutes])).toEqual([
      [1, logged.id, 9, 45],
      [2, logged.id, 9, 45],
    ]);
    const again = (
      await request(t.http)
        .get(api(`/days/${day.id}`))
        .set(crew.lead.auth)
        .expect(200)
    ).body as DayView;
    expect(again.loads).toHaveLength(2);
  });

  it('lets any member preview, only a lead start, and no one outside the kitchen either', async () => {
    const body = { batches: [pints(9)], cannerIds: [logged.id], startAt: START };
    for (const person of [crew.helper, crew.watcher]) {
      await request(t.http).post(api('/plans/preview')).set(person.auth).send(body).expect(200);
      await request(t.http)
        .post(api('/plans/start'))
        .set(person.auth)
        .send({ ...body, date: '2026-08-15' })
        .expect(403);
    }
    await request(t.http).post(api('/plans/preview')).set(crew.outsider.auth).send(body).expect(404);
    await request(t.http).post(api('/plans/preview')).send(body).expect(401);
  });

  it('refuses bad input with one issue per field, and canners or recipes of other kitchens', async () => {
    const send = (body: object) => request(t.http).post(api('/plans/preview')).set(crew.lead.auth).send(body);
    const bad = await send({ batches: [], cannerIds: [], startAt: 'tomorrow' }).expect(400);
    expect((bad.body as { issues: { path: string }[] }).issues.map((i) => i.path).sort()).toEqual([
      'batches',
      'cannerIds',
      'startAt',
    ]);
    const three = await send({ batches: [pints(9)], cannerIds: [logged.id, bare.id, measured.id], startAt: START });
    expect(three.status).toBe(400);
    await send({ batches: [pints(9)], cannerIds: [logged.id, logged.id], startAt: START }).expect(400);
    await send({
      batches: [{ ...pints(9), produce: { value: 5, unit: 'lb' } }],
      cannerIds: [logged.id],
      startAt: START,
    }).expect(400);
    await send({ batches: [pints(9)], cannerIds: [logged.id], startAt: START, extra: 1 }).expect(400);
    const foreign = (
      await request(t.http)
        .post(`/api/kitchens/${crew.otherKitchen.id}/canners`)
        .set(crew.outsider.auth)
        .send({ name: 'Theirs', method: 'boiling-water', capacity: { pint: 9 } })
        .expect(201)
    ).body as CannerView;
    await send({ batches: [pints(9)], cannerIds: [foreign.id], startAt: START }).expect(404);
    await send({ batches: [{ ...pints(9), recipeId: 'nope' }], cannerIds: [logged.id], startAt: START }).expect(404);
  });

  it('counts jars from produce: 26 lb of tomatoes fills 18 pints (13 lb per 9 pints, USDA Guide 3)', async () => {
    const batch = { recipeId: tomatoes.id, jarSize: 'pint', pack: 'hot', produce: { value: 26, unit: 'lb' } };
    const plan = planned(await preview([logged.id], [batch] as never));
    expect(plan.batches[0]).toMatchObject({ jars: 18, recipeName: tomatoes.name, tested: true });
    expect(plan.jarsBySize).toEqual([{ jarSize: 'pint', jars: 18 }]);
  });
});
