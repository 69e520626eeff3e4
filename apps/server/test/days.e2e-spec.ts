import type { DayView, LoadView, RecipeView } from '@jarday/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { kitchenWithCrew, startTestApp, type TestApp } from './support/test-app.js';

describe('canning days, batches and loads (e2e)', () => {
  let t: TestApp;
  let crew: Awaited<ReturnType<typeof kitchenWithCrew>>;
  let k: string;
  let bath: string;
  let tomatoes: RecipeView;

  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' });
    crew = await kitchenWithCrew(t.http); // at 2,100 ft
    k = crew.kitchen.id;
    bath = (
      (
        await request(t.http)
          .post(`/api/kitchens/${k}/canners`)
          .set(crew.lead.auth)
          .send({ name: 'Bath', method: 'boiling-water', capacity: { quart: 7, pint: 9 } })
      ).body as { id: string }
    ).id;
    tomatoes = (
      await request(t.http)
        .post(`/api/kitchens/${k}/recipes/copy`)
        .set(crew.lead.auth)
        .send({ recipeId: 'starter-tomatoes-in-water' })
    ).body as RecipeView;
  });
  afterAll(() => t.close());

  const newDay = async () =>
    (await request(t.http).post(`/api/kitchens/${k}/days`).set(crew.lead.auth).send({ date: '2026-08-20' }).expect(201))
      .body as DayView;

  it("snapshots the kitchen's altitude: moving the kitchen later leaves the day as it was", async () => {
    const day = await newDay();
    expect(day).toMatchObject({ title: 'Canning day', status: 'open', altitude: { value: 2100, unit: 'ft' }, seq: 1 });
    await request(t.http)
      .patch(`/api/kitchens/${k}`)
      .set(crew.lead.auth)
      .send({ altitude: { value: 7000, unit: 'ft' } })
      .expect(200);
    const again = (await request(t.http).get(`/api/kitchens/${k}/days/${day.id}`).set(crew.watcher.auth).expect(200))
      .body as DayView;
    expect(again.altitude).toEqual({ value: 2100, unit: 'ft' });
    await request(t.http)
      .patch(`/api/kitchens/${k}`)
      .set(crew.lead.auth)
      .send({ altitude: { value: 2100, unit: 'ft' } })
      .expect(200);
  });

  it('counts jars from produce with the recipe yield (USDA Guide 3: about 21 lb for 7 quarts)', async () => {
    const day = await newDay();
    const batch = await request(t.http)
      .post(`/api/kitchens/${k}/days/${day.id}/batches`)
      .set(crew.lead.auth)
      .send({ recipeId: tomatoes.id, jarSize: 'quart', pack: 'raw', produce: { value: 21, unit: 'lb' } })
      .expect(201);
    expect(batch.body).toMatchObject({ jars: 7, recipeName: tomatoes.name, tested: true });
  });

  it('plans each load at the day altitude, numbers loads, and refuses loads the canner cannot take', async () => {
    const day = await newDay();
    const batch = (
      await request(t.http)
        .post(`/api/kitchens/${k}/days/${day.id}/batches`)
        .set(crew.lead.auth)
        .send({ recipeId: tomatoes.id, jarSize: 'quart', pack: 'raw', jars: 14 })
        .expect(201)
    ).body as { id: string };
    const first = (
      await request(t.http)
        .post(`/api/kitchens/${k}/days/${day.id}/loads`)
        .set(crew.helper.auth)
        .send({ batchId: batch.id, cannerId: bath, jars: 7 })
        .expect(201)
    ).body as LoadView;
    const second = (
      await request(t.http)
        .post(`/api/kitchens/${k}/days/${day.id}/loads`)
        .set(crew.lead.auth)
        .send({ batchId: batch.id, cannerId: bath, jars: 7 })
        .expect(201)
    ).body as LoadView;
    // USDA Guide 3: quarts in water, 1,001-3,000 ft: 50 minutes.
    expect(first.plan.minutes).toBe(50);
    expect([first.number, second.number]).toEqual([1, 2]);
    const tooMany = await request(t.http)
      .post(`/api/kitchens/${k}/days/${day.id}/loads`)
      .set(crew.lead.auth)
      .send({ batchId: batch.id, cannerId: bath, jars: 8 })
      .expect(422);
    expect(tooMany.body).toMatchObject({ code: 'load_too_big', message: 'Bath holds 7 quart jars at a time, not 8' });
    await request(t.http)
      .post(`/api/kitchens/${k}/days/${day.id}/loads`)
      .set(crew.watcher.auth)
      .send({ batchId: batch.id, cannerId: bath, jars: 7 })
      .expect(403);
  });

  it('refuses a load the rules refuse, with their reason', async () => {
    const beans = (
      await request(t.http)
        .post(`/api/kitchens/${k}/recipes/copy`)
        .set(crew.lead.auth)
        .send({ recipeId: 'starter-green-beans-pressure' })
    ).body as RecipeView;
    const day = await newDay();
    const batch = (
      await request(t.http)
        .post(`/api/kitchens/${k}/days/${day.id}/batches`)
        .set(crew.lead.auth)
        .send({ recipeId: beans.id, jarSize: 'quart', pack: 'raw', jars: 7 })
        .expect(201)
    ).body as { id: string };
    const res = await request(t.http)
      .post(`/api/kitchens/${k}/days/${day.id}/loads`)
      .set(crew.lead.auth)
      .send({ batchId: batch.id, cannerId: bath, jars: 7 })
      .expect(422);
    expect(res.body).toMatchObject({ code: 'plan_refused' });
    expect((res.body as { message: string }).message).toMatch(/pressure/i);
  });

  it('only a lead opens and closes days; helpers and watchers read; other kitchens see nothing', async () => {
    await request(t.http)
      .post(`/api/kitchens/${k}/days`)
      .set(crew.helper.auth)
      .send({ date: '2026-08-21' })
      .expect(403);
    const day = await newDay();
    await request(t.http).post(`/api/kitchens/${k}/days/${day.id}/close`).set(crew.helper.auth).expect(403);
    await request(t.http).get(`/api/kitchens/${k}/days`).set(crew.watcher.auth).expect(200);
    await request(t.http).get(`/api/kitchens/${k}/days/${day.id}`).set(crew.outsider.auth).expect(404);
    await request(t.http)
      .get(`/api/kitchens/${crew.otherKitchen.id}/days/${day.id}`)
      .set(crew.outsider.auth)
      .expect(404);
    const closed = (
      await request(t.http).post(`/api/kitchens/${k}/days/${day.id}/close`).set(crew.lead.auth).expect(200)
    ).body as DayView;
    expect(closed.status).toBe('closed');
    await request(t.http).post(`/api/kitchens/${k}/days/${day.id}/close`).set(crew.lead.auth).expect(409);
    const list = (await request(t.http).get(`/api/kitchens/${k}/days?status=closed`).set(crew.lead.auth).expect(200))
      .body as DayView[];
    expect(list.map((d) => d.id)).toContain(day.id);
    await request(t.http).post(`/api/kitchens/${k}/days`).set(crew.lead.auth).send({ date: '2026-13-40' }).expect(400);
  });
});
