import { randomUUID } from 'node:crypto';
import type { ApiErrorBody, BatchView, DayJoined, JournalEvent, LoadView, RecipeView } from '@jarday/contracts';
import request from 'supertest';
import type { App } from 'supertest/types.js';
import { connectLive, type LiveClient, ok } from './live-client.js';
import type { Person, TestApp } from './test-app.js';

export const HOUR = 3600_000;
export const MINUTE = 60_000;

export interface CanningDay {
  dayId: string;
  cannerId: string;
  recipe: RecipeView;
  batches: BatchView[];
}

/**
 * A day in the kitchen with a boiling-water canner and `batches` batches of one starter recipe. Tests that freeze
 * Date call this at the frozen time, so the rows carry it.
 */
export async function canningDay(
  http: App,
  kitchenId: string,
  lead: Person,
  opts: { date?: string; starter?: string; jarSize?: string; pack?: string; batches?: number } = {},
): Promise<CanningDay> {
  const canner = (
    await request(http)
      .post(`/api/kitchens/${kitchenId}/canners`)
      .set(lead.auth)
      .send({ name: 'Water bath', method: 'boiling-water', capacity: { 'half-pint': 12, pint: 9, quart: 7 } })
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
      .send({ date: opts.date ?? '2026-08-15', title: 'Cooling test day' })
      .expect(201)
  ).body as { id: string };
  const batches: BatchView[] = [];
  for (let i = 0; i < (opts.batches ?? 1); i += 1) {
    batches.push(
      (
        await request(http)
          .post(`/api/kitchens/${kitchenId}/days/${day.id}/batches`)
          .set(lead.auth)
          .send({ recipeId: recipe.id, jarSize: opts.jarSize ?? 'half-pint', pack: opts.pack ?? 'hot', jars: 6 })
          .expect(201)
      ).body as BatchView,
    );
  }
  return { dayId: day.id, cannerId: canner.id, recipe, batches };
}

export async function addLoad(http: App, kitchenId: string, lead: Person, day: CanningDay, batchIndex = 0, jars = 6) {
  return (
    await request(http)
      .post(`/api/kitchens/${kitchenId}/days/${day.dayId}/loads`)
      .set(lead.auth)
      .send({ batchId: day.batches[batchIndex]!.id, cannerId: day.cannerId, jars })
      .expect(201)
  ).body as LoadView;
}

/**
 * Lifts a load out as a device does: starting its cooling rest over socket.io, which records `liftedAt` at the
 * server's time (the frozen Date in these tests).
 */
export async function liftLoad(t: TestApp, person: Person, dayId: string, loadId: string): Promise<void> {
  const device = await connectLive(t.url, person.token);
  try {
    await ok<DayJoined>(device, 'day:join', { dayId });
    await ok(device, 'timer:start', {
      commandId: randomUUID(),
      dayId,
      timer: { kind: 'cooling-rest', label: 'Cooling', loadId, startNow: true },
    });
  } finally {
    device.disconnect();
  }
}

/** The day's whole journal, as a device that joins from the start receives it. */
export async function journalOf(t: TestApp, person: Person, dayId: string): Promise<DayJoined> {
  const device = await connectLive(t.url, person.token);
  try {
    return await ok<DayJoined>(device, 'day:join', { dayId, sinceSeq: 0 });
  } finally {
    device.disconnect();
  }
}

export const entriesOf = (joined: DayJoined, type: string): JournalEvent[] =>
  joined.missed.filter((e) => e.type === type);

/**
 * Waits for a broadcast by counting polls rather than reading the clock, since these tests freeze Date; the real
 * setTimeout still runs.
 */
export async function receive(client: LiveClient, match: (e: JournalEvent) => boolean): Promise<JournalEvent> {
  for (let i = 0; i < 500; i += 1) {
    const found = client.received.find(match);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 10));
  }
  throw new Error(`no matching event; got ${client.received.map((e) => e.type).join(', ')}`);
}

/** The error body of a refused request. */
export const errorOf = (res: { body: unknown }) => res.body as ApiErrorBody;
