import type { DayView, LoadView, RecipeView } from '@jarday/contracts';
import request from 'supertest';
import type { App } from 'supertest/types.js';
import type { Person } from './test-app.js';

/** A day in the crew's kitchen with one batch of a starter recipe and one load in a new canner of the given kind. */
export async function dayWithLoad(
  http: App,
  kitchenId: string,
  lead: Person,
  opts: { starter?: string; method?: 'boiling-water' | 'pressure'; jarSize?: string; pack?: string } = {},
): Promise<{ day: DayView; load: LoadView }> {
  const method = opts.method ?? 'boiling-water';
  const canner = (
    await request(http)
      .post(`/api/kitchens/${kitchenId}/canners`)
      .set(lead.auth)
      .send(
        method === 'pressure'
          ? { name: 'Pressure canner', method, gauge: 'weighted', capacity: { pint: 10, quart: 7 } }
          : { name: 'Water bath', method, capacity: { 'half-pint': 12, pint: 9, quart: 7 } },
      )
      .expect(201)
  ).body as { id: string };
  const recipe = (
    await request(http)
      .post(`/api/kitchens/${kitchenId}/recipes/copy`)
      .set(lead.auth)
      .send({ recipeId: opts.starter ?? 'starter-hot-packed-jam' })
      .expect(201)
  ).body as RecipeView;
  const day = (
    await request(http)
      .post(`/api/kitchens/${kitchenId}/days`)
      .set(lead.auth)
      .send({ date: '2026-08-15', title: 'Test day' })
      .expect(201)
  ).body as DayView;
  const batch = (
    await request(http)
      .post(`/api/kitchens/${kitchenId}/days/${day.id}/batches`)
      .set(lead.auth)
      .send({ recipeId: recipe.id, jarSize: opts.jarSize ?? 'half-pint', pack: opts.pack ?? 'hot', jars: 6 })
      .expect(201)
  ).body as { id: string };
  const load = (
    await request(http)
      .post(`/api/kitchens/${kitchenId}/days/${day.id}/loads`)
      .set(lead.auth)
      .send({ batchId: batch.id, cannerId: canner.id, jars: 6 })
      .expect(201)
  ).body as LoadView;
  return { day, load };
}
