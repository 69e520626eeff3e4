import type { PlanAnswer, RecipeView } from '@jarday/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { kitchenWithCrew, startTestApp, type TestApp } from './support/test-app.js';

type Crew = Awaited<ReturnType<typeof kitchenWithCrew>>;

describe('the Recipe box and process plans (e2e)', () => {
  let t: TestApp;
  let crew: Crew;
  let k: string;
  const canners: Record<string, string> = {};

  const addCanner = async (body: object) =>
    (
      (await request(t.http).post(`/api/kitchens/${k}/canners`).set(crew.lead.auth).send(body).expect(201)).body as {
        id: string;
      }
    ).id;
  const copy = async (recipeId: string) =>
    (await request(t.http).post(`/api/kitchens/${k}/recipes/copy`).set(crew.lead.auth).send({ recipeId }).expect(201))
      .body as RecipeView;
  const plan = async (recipeId: string, jarSize: string, pack: string, canner: string) =>
    (
      await request(t.http)
        .get(`/api/kitchens/${k}/recipes/${recipeId}/plan`)
        .query({ jarSize, pack, cannerId: canners[canner] })
        .set(crew.helper.auth)
        .expect(200)
    ).body as PlanAnswer;

  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' });
    crew = await kitchenWithCrew(t.http); // the kitchen is at 2,100 ft
    k = crew.kitchen.id;
    canners.bath = await addCanner({
      name: 'Bath',
      method: 'boiling-water',
      capacity: { pint: 9, quart: 7, 'half-pint': 12 },
    });
    canners.smallBath = await addCanner({ name: 'Small bath', method: 'boiling-water', capacity: { pint: 8 } });
    canners.weighted = await addCanner({
      name: 'Weighted',
      method: 'pressure',
      gauge: 'weighted',
      capacity: { pint: 10, quart: 7 },
    });
    canners.dial = await addCanner({
      name: 'Dial',
      method: 'pressure',
      gauge: 'dial',
      capacity: { pint: 10, quart: 7 },
    });
  });
  afterAll(() => t.close());

  it('offers the starter set to anyone signed in, each citing its source', async () => {
    const res = await request(t.http).get('/api/recipes/starters').set(crew.outsider.auth).expect(200);
    const starters = res.body as RecipeView[];
    expect(starters.map((s) => s.category).sort()).toEqual([
      'jam',
      'pickles',
      'salsa',
      'tomatoes',
      'tomatoes',
      'vegetables',
    ]);
    for (const s of starters) {
      expect(s.tested).toBe(true);
      expect(s.source?.citation).toMatch(/USDA|National Center for Home Food Preservation/);
    }
    await request(t.http).get('/api/recipes/starters').expect(401);
  });

  it('plans whole tomatoes at 2,100 ft: 45 min for pints (USDA Guide 3, 1,001-3,000 ft band)', async () => {
    const r = await copy('starter-tomatoes-in-water');
    const answer = await plan(r.id, 'pint', 'hot', 'bath');
    expect(answer.ok).toBe(true);
    if (!answer.ok) return;
    expect(answer.plan.minutes).toBe(45);
    expect(answer.plan.headspace.inches).toBe(0.5);
    // USDA Guide 3: per pint 1 Tbsp bottled lemon juice or 1/4 tsp citric acid.
    expect(JSON.stringify(answer.plan.acidPerJar)).toMatch(/lemon/i);
    expect(answer.cautions.map((c) => c.id)).toContain('altitude');
    const quart = await plan(r.id, 'quart', 'raw', 'bath');
    expect(quart.ok && quart.plan.minutes).toBe(50);
  });

  it('plans salsa at 2,100 ft: 20 min (NCHFP, 1,001-6,000 ft band) with the salsa caution', async () => {
    const r = await copy('starter-tomato-salsa');
    const answer = await plan(r.id, 'pint', 'hot', 'bath');
    expect(answer.ok && answer.plan.minutes).toBe(20);
    expect(answer.ok && answer.cautions.map((c) => c.id)).toContain('salsa-changes');
  });

  it('gives pressure by gauge at 2,100 ft: weighted 15 lb, dial 12 lb (USDA Guide; PNW 421)', async () => {
    const r = await copy('starter-green-beans-pressure');
    const weighted = await plan(r.id, 'quart', 'raw', 'weighted');
    const dial = await plan(r.id, 'quart', 'raw', 'dial');
    expect(weighted.ok && weighted.plan.pressure).toEqual({ pounds: 15, gauge: 'weighted' });
    expect(dial.ok && dial.plan.pressure).toEqual({ pounds: 12, gauge: 'dial' });
    expect(dial.ok && dial.cautions.map((c) => c.id)).toContain('dial-gauge-check');
  });

  it('refuses each plan that cannot be made, with its reason', async () => {
    const salsa = await copy('starter-tomato-salsa');
    const beans = await copy('starter-green-beans-pressure');
    const tomatoes = await copy('starter-tomatoes-in-water');
    const cases: [string, string, string, string, string][] = [
      [salsa.id, 'quart', 'hot', 'bath', 'no-tested-time'],
      [beans.id, 'pint', 'raw', 'bath', 'low-acid-needs-pressure'],
      [tomatoes.id, 'quart', 'raw', 'smallBath', 'canner-jar-size'],
      [tomatoes.id, 'pint', 'raw', 'weighted', 'method-mismatch'],
    ];
    for (const [recipe, jar, pack, canner, code] of cases) {
      const answer = await plan(recipe, jar, pack, canner);
      expect(answer, `${jar} ${pack} in ${canner}`).toMatchObject({ ok: false, reason: { code } });
      expect(answer.ok === false && answer.reason.message.length).toBeGreaterThan(10);
    }
    // Above the pressure table (10,000 ft): no tested pressure.
    await request(t.http)
      .patch(`/api/kitchens/${k}`)
      .set(crew.lead.auth)
      .send({ altitude: { value: 3500, unit: 'm' } })
      .expect(200);
    const high = await plan(beans.id, 'pint', 'raw', 'weighted');
    expect(high).toMatchObject({ ok: false, reason: { code: 'altitude-beyond-table' } });
    await request(t.http)
      .patch(`/api/kitchens/${k}`)
      .set(crew.lead.auth)
      .send({ altitude: { value: 2100, unit: 'ft' } })
      .expect(200);
  });

  it('validates the plan query', async () => {
    const r = await copy('starter-hot-packed-jam');
    const res = await request(t.http)
      .get(`/api/kitchens/${k}/recipes/${r.id}/plan`)
      .query({ jarSize: 'bucket', pack: 'hot' })
      .set(crew.lead.auth)
      .expect(400);
    expect((res.body as { issues: { path: string }[] }).issues.map((i) => i.path).sort()).toEqual([
      'cannerId',
      'jarSize',
    ]);
  });

  it('editing a tested recipe keeps it tested, until its times change', async () => {
    const r = await copy('starter-quick-dill-pickles');
    const { id: _id, kitchenId: _k, copiedFrom: _c, createdAt: _a, updatedAt: _u, ...data } = r;
    const renamed = await request(t.http)
      .put(`/api/kitchens/${k}/recipes/${r.id}`)
      .set(crew.lead.auth)
      .send({ ...data, name: 'Dills for the shop window', notes: 'Grandmother liked them with garlic.' })
      .expect(200);
    expect(renamed.body).toMatchObject({
      recipe: { tested: true, name: 'Dills for the shop window' },
      notice: { untestedBecause: null },
    });

    const table = structuredClone(data.processing);
    table.boilingWater!.rows[0]!.minutes = [12, 15, 20];
    const retimed = await request(t.http)
      .put(`/api/kitchens/${k}/recipes/${r.id}`)
      .set(crew.lead.auth)
      .send({ ...data, processing: table, tested: true })
      .expect(200);
    expect(retimed.body).toMatchObject({
      recipe: { tested: false },
      notice: { untestedBecause: expect.stringMatching(/untested/) as string },
    });
    const after = await plan(r.id, 'pint', 'raw', 'bath');
    expect(after.ok && after.plan.minutes).toBe(15);
    expect(after.ok && after.plan.tested).toBe(false);
  });

  it('refuses a recipe that breaks the rules, naming the field', async () => {
    const res = await request(t.http)
      .post(`/api/kitchens/${k}/recipes`)
      .set(crew.lead.auth)
      .send({
        name: 'Grandma beans',
        productClass: 'low-acid',
        tested: true,
        headspaceInches: 1,
        processing: {
          boilingWater: { bands: [1000, null], rows: [{ jarSize: 'quart', pack: 'raw', minutes: [180, 180] }] },
        },
      })
      .expect(400);
    const paths = (res.body as { issues: { path: string }[] }).issues.map((i) => i.path);
    expect(paths).toContain('processing.boilingWater');
    expect(paths).toContain('source');
  });

  it('lets the lead edit, helpers and watchers read, and keeps other kitchens out', async () => {
    const r = await copy('starter-hot-packed-jam');
    await request(t.http).get(`/api/kitchens/${k}/recipes/${r.id}`).set(crew.watcher.auth).expect(200);
    await request(t.http).get(`/api/kitchens/${k}/recipes`).set(crew.helper.auth).expect(200);
    for (const who of [crew.helper, crew.watcher]) {
      await request(t.http)
        .post(`/api/kitchens/${k}/recipes/copy`)
        .set(who.auth)
        .send({ recipeId: 'starter-hot-packed-jam' })
        .expect(403);
      await request(t.http).delete(`/api/kitchens/${k}/recipes/${r.id}`).set(who.auth).expect(403);
    }
    await request(t.http).get(`/api/kitchens/${k}/recipes/${r.id}`).set(crew.outsider.auth).expect(404);
    // Nor through the outsider's own kitchen.
    await request(t.http)
      .get(`/api/kitchens/${crew.otherKitchen.id}/recipes/${r.id}`)
      .set(crew.outsider.auth)
      .expect(404);
    await request(t.http)
      .post(`/api/kitchens/${crew.otherKitchen.id}/recipes/copy`)
      .set(crew.outsider.auth)
      .send({ recipeId: r.id })
      .expect(404);
    await request(t.http).delete(`/api/kitchens/${k}/recipes/${r.id}`).set(crew.lead.auth).expect(204);
    await request(t.http).get(`/api/kitchens/${k}/recipes/${r.id}`).set(crew.lead.auth).expect(404);
  });
});
