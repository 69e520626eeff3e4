import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { kitchenWithCrew, registerPerson, startTestApp, type TestApp } from './support/test-app.js';

type Crew = Awaited<ReturnType<typeof kitchenWithCrew>>;
type Who = 'lead' | 'helper' | 'watcher' | 'outsider';
type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

interface RouteCase {
  name: string;
  method: Method;
  /** Builds the path, and any body, for a kitchen; `fresh` gives ids made just for this call. */
  path: (kitchenId: string, fresh: Fresh) => string;
  body?: object;
  /** Status each caller gets when reaching for the crew's kitchen. */
  expect: Record<Who, number>;
}

interface Fresh {
  cannerId: string;
  inviteId: string;
  memberId: string;
}

const canner = { name: 'Speckled bath', method: 'boiling-water', capacity: { quart: 7, pint: 9 } };
const MEMBER_READ = { lead: 200, helper: 200, watcher: 200, outsider: 404 };
const LEAD_ONLY = (ok: number) => ({ lead: ok, helper: 403, watcher: 403, outsider: 404 });

/** Every kitchen route, with what each role may do (a non-member always gets 404). */
const ROUTES: RouteCase[] = [
  { name: 'read kitchen', method: 'get', path: (k) => `/api/kitchens/${k}`, expect: MEMBER_READ },
  {
    name: 'rename kitchen',
    method: 'patch',
    path: (k) => `/api/kitchens/${k}`,
    body: { name: 'Renamed' },
    expect: LEAD_ONLY(200),
  },
  { name: 'list members', method: 'get', path: (k) => `/api/kitchens/${k}/members`, expect: MEMBER_READ },
  {
    name: 'change a role',
    method: 'patch',
    path: (k, f) => `/api/kitchens/${k}/members/${f.memberId}`,
    body: { role: 'watcher' },
    expect: LEAD_ONLY(200),
  },
  {
    name: 'remove a member',
    method: 'delete',
    path: (k, f) => `/api/kitchens/${k}/members/${f.memberId}`,
    expect: LEAD_ONLY(204),
  },
  { name: 'list invites', method: 'get', path: (k) => `/api/kitchens/${k}/invites`, expect: LEAD_ONLY(200) },
  {
    name: 'create invite',
    method: 'post',
    path: (k) => `/api/kitchens/${k}/invites`,
    body: { role: 'helper' },
    expect: LEAD_ONLY(201),
  },
  {
    name: 'revoke invite',
    method: 'delete',
    path: (k, f) => `/api/kitchens/${k}/invites/${f.inviteId}`,
    expect: LEAD_ONLY(204),
  },
  { name: 'list canners', method: 'get', path: (k) => `/api/kitchens/${k}/canners`, expect: MEMBER_READ },
  {
    name: 'add canner',
    method: 'post',
    path: (k) => `/api/kitchens/${k}/canners`,
    body: canner,
    expect: LEAD_ONLY(201),
  },
  {
    name: 'edit canner',
    method: 'put',
    path: (k, f) => `/api/kitchens/${k}/canners/${f.cannerId}`,
    body: { ...canner, name: 'Edited' },
    expect: LEAD_ONLY(200),
  },
  {
    name: 'delete canner',
    method: 'delete',
    path: (k, f) => `/api/kitchens/${k}/canners/${f.cannerId}`,
    expect: LEAD_ONLY(204),
  },
];

describe('kitchen routes: the role matrix (e2e)', () => {
  let t: TestApp;
  let crew: Crew;

  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' });
    crew = await kitchenWithCrew(t.http);
  });
  afterAll(() => t.close());

  /** Ids made fresh for each call, so a delete in one case cannot change the next. */
  async function fresh(): Promise<Fresh> {
    const k = crew.kitchen.id;
    const lead = crew.lead.auth;
    const c = await request(t.http).post(`/api/kitchens/${k}/canners`).set(lead).send(canner).expect(201);
    const i = await request(t.http).post(`/api/kitchens/${k}/invites`).set(lead).send({ role: 'watcher' }).expect(201);
    const member = await registerPerson(t.http, 'Extra');
    const j = await request(t.http).post(`/api/kitchens/${k}/invites`).set(lead).send({ role: 'helper' }).expect(201);
    await request(t.http)
      .post(`/api/invites/${(j.body as { code: string }).code}/redeem`)
      .set(member.auth)
      .expect(200);
    return {
      cannerId: (c.body as { id: string }).id,
      inviteId: (i.body as { id: string }).id,
      memberId: member.user.id,
    };
  }

  for (const route of ROUTES) {
    for (const who of ['lead', 'helper', 'watcher', 'outsider'] as const) {
      it(`${route.name}: ${who} gets ${route.expect[who]}`, async () => {
        const f = await fresh();
        const call = request(t.http)[route.method](route.path(crew.kitchen.id, f)).set(crew[who].auth);
        const res = route.body ? await call.send(route.body) : await call;
        expect(res.status, JSON.stringify(res.body)).toBe(route.expect[who]);
        if (res.status === 404) expect(res.body).toMatchObject({ code: 'not_found', message: 'Kitchen not found' });
        if (res.status === 403) expect(res.body).toMatchObject({ code: 'forbidden' });
      });
    }
    it(`${route.name}: signed out gets 401`, async () => {
      const f = await fresh();
      const call = request(t.http)[route.method](route.path(crew.kitchen.id, f));
      const res = route.body ? await call.send(route.body) : await call;
      expect(res.status).toBe(401);
    });
  }

  it("a member of kitchen A cannot reach kitchen B's members, canners or invites by id", async () => {
    const b = crew.otherKitchen.id;
    for (const path of [
      `/api/kitchens/${b}`,
      `/api/kitchens/${b}/members`,
      `/api/kitchens/${b}/canners`,
      `/api/kitchens/${b}/invites`,
    ]) {
      const res = await request(t.http).get(path).set(crew.lead.auth);
      expect(res.status, path).toBe(404);
    }
    // Nor edit another kitchen's canner through its own kitchen's path.
    const other = await request(t.http)
      .post(`/api/kitchens/${b}/canners`)
      .set(crew.outsider.auth)
      .send(canner)
      .expect(201);
    const res = await request(t.http)
      .put(`/api/kitchens/${crew.kitchen.id}/canners/${(other.body as { id: string }).id}`)
      .set(crew.lead.auth)
      .send(canner);
    expect(res.status).toBe(404);
  });

  it('lists only my kitchens, each with my role', async () => {
    const res = await request(t.http).get('/api/kitchens').set(crew.helper.auth).expect(200);
    const list = res.body as { id: string; role: string }[];
    expect(list.map((k) => [k.id, k.role])).toEqual([[crew.kitchen.id, 'helper']]);
  });
});

describe('kitchens: leads, leaving and invites (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' });
  });
  afterAll(() => t.close());

  it('the creator becomes lead; the last lead can neither leave nor step down', async () => {
    const crew = await kitchenWithCrew(t.http);
    const k = crew.kitchen.id;
    const me = await request(t.http).get(`/api/kitchens/${k}`).set(crew.lead.auth).expect(200);
    expect(me.body).toMatchObject({ role: 'lead', memberCount: 3, altitude: { value: 2100, unit: 'ft' }, units: 'us' });

    const leave = await request(t.http)
      .delete(`/api/kitchens/${k}/members/${crew.lead.user.id}`)
      .set(crew.lead.auth)
      .expect(409);
    expect(leave.body).toMatchObject({ code: 'last_lead' });
    await request(t.http)
      .patch(`/api/kitchens/${k}/members/${crew.lead.user.id}`)
      .set(crew.lead.auth)
      .send({ role: 'helper' })
      .expect(409);

    // With a second lead, the first may leave.
    await request(t.http)
      .patch(`/api/kitchens/${k}/members/${crew.helper.user.id}`)
      .set(crew.lead.auth)
      .send({ role: 'lead' })
      .expect(200);
    await request(t.http).delete(`/api/kitchens/${k}/members/${crew.lead.user.id}`).set(crew.lead.auth).expect(204);
    await request(t.http).get(`/api/kitchens/${k}`).set(crew.lead.auth).expect(404);
  });

  it('a helper may leave but not remove others', async () => {
    const crew = await kitchenWithCrew(t.http);
    const k = crew.kitchen.id;
    await request(t.http)
      .delete(`/api/kitchens/${k}/members/${crew.watcher.user.id}`)
      .set(crew.helper.auth)
      .expect(403);
    await request(t.http).delete(`/api/kitchens/${k}/members/${crew.helper.user.id}`).set(crew.helper.auth).expect(204);
    const members = await request(t.http).get(`/api/kitchens/${k}/members`).set(crew.lead.auth).expect(200);
    expect((members.body as { role: string }[]).map((m) => m.role).sort()).toEqual(['lead', 'watcher']);
  });

  it('an invite code works once, with or without its dash and in any case, and not after revoking', async () => {
    const lead = await registerPerson(t.http, 'Lead');
    const k = (await request(t.http).post('/api/kitchens').set(lead.auth).send({ name: 'Invite kitchen' }).expect(201))
      .body as { id: string };
    const invite = (
      await request(t.http).post(`/api/kitchens/${k.id}/invites`).set(lead.auth).send({ role: 'watcher' }).expect(201)
    ).body as { id: string; code: string };
    expect(invite.code).toMatch(/^[2-9A-HJKMNP-Z]{4}-[2-9A-HJKMNP-Z]{4}$/);

    const guest = await registerPerson(t.http, 'Guest');
    const typed = invite.code.replace('-', '').toLowerCase();
    const preview = await request(t.http).get(`/api/invites/${typed}`).set(guest.auth).expect(200);
    expect(preview.body).toMatchObject({
      kitchenId: k.id,
      kitchenName: 'Invite kitchen',
      role: 'watcher',
      alreadyMember: false,
    });
    const joined = await request(t.http).post(`/api/invites/${typed}/redeem`).set(guest.auth).expect(200);
    expect(joined.body).toMatchObject({ id: k.id, role: 'watcher' });

    const late = await registerPerson(t.http, 'Late');
    const used = await request(t.http).post(`/api/invites/${invite.code}/redeem`).set(late.auth).expect(404);
    expect(used.body).toMatchObject({ code: 'invite_not_found' });

    const second = (await request(t.http).post(`/api/kitchens/${k.id}/invites`).set(lead.auth).send({}).expect(201))
      .body as {
      id: string;
      code: string;
      role: string;
    };
    expect(second.role).toBe('helper');
    await request(t.http).delete(`/api/kitchens/${k.id}/invites/${second.id}`).set(lead.auth).expect(204);
    await request(t.http).post(`/api/invites/${second.code}/redeem`).set(late.auth).expect(404);
    const open = await request(t.http).get(`/api/kitchens/${k.id}/invites`).set(lead.auth).expect(200);
    expect(open.body).toEqual([]);
  });

  it('keeps kitchen settings: altitude in metres, units, canners with gauges', async () => {
    const lead = await registerPerson(t.http, 'Lead');
    const k = (
      await request(t.http)
        .post('/api/kitchens')
        .set(lead.auth)
        .send({ name: 'High kitchen', altitude: { value: 1600, unit: 'm' }, units: 'metric' })
        .expect(201)
    ).body as { id: string };
    const patched = await request(t.http)
      .patch(`/api/kitchens/${k.id}`)
      .set(lead.auth)
      .send({ altitude: { value: 5250, unit: 'ft' }, units: 'us' })
      .expect(200);
    expect(patched.body).toMatchObject({ name: 'High kitchen', altitude: { value: 5250, unit: 'ft' }, units: 'us' });

    const pressure = await request(t.http)
      .post(`/api/kitchens/${k.id}/canners`)
      .set(lead.auth)
      .send({ name: 'Tall pressure canner', method: 'pressure', gauge: 'dial', capacity: { quart: 7, pint: 10 } })
      .expect(201);
    expect(pressure.body).toMatchObject({ method: 'pressure', gauge: 'dial', capacity: { quart: 7, pint: 10 } });
    const list = await request(t.http).get(`/api/kitchens/${k.id}/canners`).set(lead.auth).expect(200);
    expect((list.body as unknown[]).length).toBe(1);
  });
});
