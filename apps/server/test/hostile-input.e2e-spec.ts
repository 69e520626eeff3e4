import type { DayJoined } from '@jarday/contracts';
import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dayWithLoad } from './support/day-fixture.js';
import { call, connectLive, ok } from './support/live-client.js';
import { kitchenWithCrew, startTestApp, type TestApp } from './support/test-app.js';

const EVENTS = ['day:join', 'day:leave', 'timer:start', 'timer:command', 'alarm:ack', 'clock:ping', 'session:renew'];

/** Garbage of every shape: wrong types, huge strings, deep nesting, prototype tricks, other days' ids. */
const hostileValue = (otherDayId: string, otherTimerId: string) =>
  fc.oneof(
    fc.anything({ maxDepth: 4 }),
    fc.string({ minLength: 5000, maxLength: 12_000 }),
    fc.record({
      dayId: fc.constant(otherDayId),
      timerId: fc.constant(otherTimerId),
      commandId: fc.uuid(),
      command: fc.anything(),
    }),
    fc.record({
      commandId: fc.constant('not-a-uuid'),
      dayId: fc.uuid(),
      timer: fc.record({ kind: fc.string(), label: fc.string() }),
    }),
    fc.record({ t1: fc.oneof(fc.double(), fc.string(), fc.constant(-1)) }),
    fc.constant(JSON.parse('{"__proto__":{"polluted":true},"dayId":"x"}') as unknown),
    fc.record({ dayId: fc.uuid(), sinceSeq: fc.oneof(fc.integer({ min: -10 }), fc.double(), fc.string()) }),
  );

describe('hostile input (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '10000' }, true);
  });
  afterAll(() => t.close());

  it('answers 1,000 malformed socket messages with errors, stays up, and leaves the journal intact', async () => {
    const crew = await kitchenWithCrew(t.http);
    const { day } = await dayWithLoad(t.http, crew.kitchen.id, crew.lead);
    const other = await dayWithLoad(t.http, crew.otherKitchen.id, crew.outsider);
    const helper = await connectLive(t.url, crew.helper.token);
    const before = await ok<DayJoined>(helper, 'day:join', { dayId: day.id, sinceSeq: 0 });
    const otherJoin = await ok<DayJoined>(await connectLive(t.url, crew.outsider.token), 'day:join', {
      dayId: other.day.id,
    });
    const otherTimer = otherJoin.snapshot.timers[0]!.id;

    const samples = fc.sample(
      fc.tuple(fc.constantFrom(...EVENTS, 'no:such-event', 'constructor'), hostileValue(other.day.id, otherTimer)),
      {
        numRuns: 1000,
        seed: 5905,
      },
    );
    let errors = 0;
    let dataAnswers = 0;
    for (const [event, payload] of samples) {
      const answer = await call<unknown>(helper, event, payload);
      if ('error' in answer) {
        errors += 1;
        expect(typeof answer.error.message).toBe('string');
        expect(answer.error.message).not.toMatch(/at .*\.(js|ts):\d+/);
      } else dataAnswers += 1;
    }
    // A random value can be a valid message only by luck (a clock ping with a good t1, a leave): never a change.
    expect(errors + dataAnswers).toBe(1000);
    expect(errors).toBeGreaterThan(950);

    const after = await ok<DayJoined>(helper, 'day:join', { dayId: day.id, sinceSeq: 0 });
    expect(after.snapshot.seq).toBe(before.snapshot.seq);
    expect(after.missed).toEqual(before.missed);
    const otherAfter = await ok<DayJoined>(await connectLive(t.url, crew.outsider.token), 'day:join', {
      dayId: other.day.id,
      sinceSeq: 0,
    });
    expect(otherAfter.snapshot.seq).toBe(otherJoin.snapshot.seq);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    helper.disconnect();
  });

  it('answers 1,000 malformed REST bodies and queries with 4xx JSON, and changes nothing', async () => {
    const crew = await kitchenWithCrew(t.http);
    const { day } = await dayWithLoad(t.http, crew.kitchen.id, crew.lead);
    const k = crew.kitchen.id;
    const routes: [string, string][] = [
      ['post', `/api/kitchens/${k}/days`],
      ['post', `/api/kitchens/${k}/days/${day.id}/batches`],
      ['post', `/api/kitchens/${k}/days/${day.id}/loads`],
      ['post', `/api/kitchens/${k}/canners`],
      ['post', `/api/kitchens/${k}/recipes`],
      ['patch', `/api/kitchens/${k}`],
      ['post', '/api/auth/sign-in'],
      ['get', `/api/kitchens/${k}/days?status=`],
    ];
    const before = (await request(t.http).get(`/api/kitchens/${k}/days/${day.id}`).set(crew.lead.auth).expect(200))
      .body as object;
    const bodies = fc.sample(fc.anything({ maxDepth: 3 }), { numRuns: 1000, seed: 4180 });
    let i = 0;
    for (const body of bodies) {
      const [method, path] = routes[i++ % routes.length]!;
      const agent = request(t.http);
      const url = method === 'get' ? `${path}${encodeURIComponent(JSON.stringify(body))}` : path;
      const req = (method === 'get' ? agent.get(url) : agent[method as 'post'](url)).set(crew.lead.auth);
      const res = await (method === 'get'
        ? req
        : req.set('Content-Type', 'application/json').send(JSON.stringify(body) ?? 'null'));
      expect(res.status, `${method} ${path} ${JSON.stringify(body)}`).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      expect(res.body).toHaveProperty('message');
    }
    const after = (await request(t.http).get(`/api/kitchens/${k}/days/${day.id}`).set(crew.lead.auth).expect(200))
      .body as object;
    expect(after).toEqual(before);
    await request(t.http).get('/api/health').expect(200);
  });
});
