import { join } from 'node:path';
import type { CreatedInviteView, InvitePreview, KitchenView, MyMembershipView } from '@jarday/contracts';
import Database from 'better-sqlite3';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MailCatcher } from '../src/mail/mail-catcher.js';
import { dayWithLoad } from './support/day-fixture.js';
import { freePort } from './support/server-process.js';
import { kitchenWithCrew, registerPerson, startTestApp, type TestApp } from './support/test-app.js';

type Crew = Awaited<ReturnType<typeof kitchenWithCrew>>;

describe('e-mail through a real SMTP catcher on loopback (e2e)', () => {
  let catcher: MailCatcher;
  let t: TestApp;
  let crew: Crew;

  beforeAll(async () => {
    catcher = await MailCatcher.start();
    t = await startTestApp({
      SMTP_URL: catcher.url,
      PUBLIC_URL: 'http://jarday.test:8080',
      SIGNIN_THROTTLE_LIMIT: '1000',
    });
    crew = await kitchenWithCrew(t.http);
  });
  afterAll(async () => {
    await t.close();
    await catcher.close();
  });

  it('mails the invite link with the kitchen and role; the link joins the kitchen', async () => {
    const res = await request(t.http)
      .post(`/api/kitchens/${crew.kitchen.id}/invites`)
      .set(crew.lead.auth)
      .send({ role: 'watcher', email: '  New.Cook@Example.TEST ' })
      .expect(201);
    const invite = res.body as CreatedInviteView;
    expect(invite.emailedTo).toBe('new.cook@example.test');

    const mail = await catcher.waitFor((m) => m.to.includes('new.cook@example.test'));
    expect(mail.subject).toBe('Join Test kitchen on Jarday');
    expect(mail.text).toContain('Lead invites you to Test kitchen');
    expect(mail.text).toContain('as a watcher');
    expect(mail.text).toContain(invite.code);
    const link = mail.links.find((l) => l.includes('/join/'));
    expect(link).toBe(`http://jarday.test:8080/join/${invite.code.replace('-', '')}`);
    expect(mail.html).toContain(`href="${link}"`);

    const code = new URL(link!).pathname.split('/').pop()!;
    const newcomer = await registerPerson(t.http, 'New Cook');
    const preview = (await request(t.http).get(`/api/invites/${code}`).set(newcomer.auth).expect(200))
      .body as InvitePreview;
    expect(preview).toMatchObject({ kitchenId: crew.kitchen.id, kitchenName: 'Test kitchen', role: 'watcher' });
    const joined = (await request(t.http).post(`/api/invites/${code}/redeem`).set(newcomer.auth).expect(200))
      .body as KitchenView;
    expect(joined).toMatchObject({ id: crew.kitchen.id, role: 'watcher' });
  });

  it('an invite without an address mails nothing and says so', async () => {
    const res = await request(t.http)
      .post(`/api/kitchens/${crew.kitchen.id}/invites`)
      .set(crew.lead.auth)
      .send({ role: 'helper' })
      .expect(201);
    expect((res.body as CreatedInviteView).emailedTo).toBeNull();
  });

  it('refuses a bad address with a 400 naming the field, and creates no invite', async () => {
    const before = (await request(t.http).get(`/api/kitchens/${crew.kitchen.id}/invites`).set(crew.lead.auth))
      .body as [];
    const res = await request(t.http)
      .post(`/api/kitchens/${crew.kitchen.id}/invites`)
      .set(crew.lead.auth)
      .send({ role: 'helper', email: 'not-an-address' })
      .expect(400);
    expect(res.body).toMatchObject({
      code: 'validation_failed',
      issues: [{ path: 'email', message: 'Enter a valid e-mail address' }],
    });
    const after = (await request(t.http).get(`/api/kitchens/${crew.kitchen.id}/invites`).set(crew.lead.auth))
      .body as [];
    expect(after).toHaveLength(before.length);
  });

  it('lets each member turn their own reminders off and on (members/me)', async () => {
    const base = `/api/kitchens/${crew.kitchen.id}/members/me`;
    const first = (await request(t.http).get(base).set(crew.helper.auth).expect(200)).body as MyMembershipView;
    expect(first).toEqual({ kitchenId: crew.kitchen.id, userId: crew.helper.user.id, role: 'helper', reminders: true });

    const off = (await request(t.http).patch(base).set(crew.helper.auth).send({ reminders: false }).expect(200))
      .body as MyMembershipView;
    expect(off.reminders).toBe(false);
    expect(((await request(t.http).get(base).set(crew.helper.auth)).body as MyMembershipView).reminders).toBe(false);
    // Only the caller's own row changed.
    expect(((await request(t.http).get(base).set(crew.lead.auth)).body as MyMembershipView).reminders).toBe(true);

    const watcher = await request(t.http).patch(base).set(crew.watcher.auth).send({ reminders: false }).expect(200);
    expect((watcher.body as MyMembershipView).reminders).toBe(false);
    await request(t.http).patch(base).set(crew.helper.auth).send({ reminders: true }).expect(200);
    await request(t.http).patch(base).set(crew.watcher.auth).send({ reminders: true }).expect(200);

    const bad = await request(t.http).patch(base).set(crew.helper.auth).send({ reminders: 'no' }).expect(400);
    expect(bad.body).toMatchObject({ issues: [{ path: 'reminders', message: 'On or off' }] });
    // Strict: a role cannot ride along.
    await request(t.http).patch(base).set(crew.helper.auth).send({ reminders: true, role: 'lead' }).expect(400);
    await request(t.http).patch(base).set(crew.outsider.auth).send({ reminders: false }).expect(404);
    // The lead's route for others' roles still works beside "me".
    await request(t.http)
      .patch(`/api/kitchens/${crew.kitchen.id}/members/${crew.watcher.user.id}`)
      .set(crew.lead.auth)
      .send({ role: 'watcher' })
      .expect(200);
  });

  it('mails every member a summary of the day when it is closed, with the seal rate of the checks', async () => {
    const { day, load } = await dayWithLoad(t.http, crew.kitchen.id, crew.lead);
    // Seal checks belong to the cooling shelf; written straight into the test database here.
    const sqlite = new Database(join(t.dir, 'jarday.sqlite'));
    const check = sqlite.prepare(
      `insert into seal_checks (load_id, jar_number, day_id, result, outcome, checked_at, by_name) values (?, ?, ?, ?, ?, ?, 'Lead')`,
    );
    check.run(load.id, 1, day.id, 'sealed', 'store', Date.now());
    check.run(load.id, 2, day.id, 'sealed', 'store', Date.now());
    check.run(load.id, 3, day.id, 'unsealed', 'fridge', Date.now());
    sqlite.close();

    await request(t.http).post(`/api/kitchens/${crew.kitchen.id}/days/${day.id}/close`).set(crew.lead.auth).expect(200);
    for (const person of [crew.lead, crew.helper, crew.watcher]) {
      const mail = await catcher.waitFor(
        (m) => m.to.includes(person.user.email) && m.subject === 'Test kitchen: Test day is closed',
      );
      expect(mail.text).toContain('1 load, 6 jars in all.');
      expect(mail.text).toContain('- Load 1: Hot-packed jam');
      expect(mail.text).toContain('2 of 3 sealed (67 %)');
      expect(mail.links).toContain(`http://jarday.test:8080/kitchens/${crew.kitchen.id}/days/${day.id}`);
    }
    expect(catcher.messages().some((m) => m.to.includes(crew.outsider.user.email))).toBe(false);
  });
});

describe('mail that cannot be sent, and the dev catcher route (e2e)', () => {
  it('answers the invite even when the SMTP server is unreachable, and links to the page the lead was on', async () => {
    const t = await startTestApp({ SMTP_URL: `smtp://127.0.0.1:${await freePort()}` });
    try {
      const lead = await registerPerson(t.http, 'Lead');
      const kitchen = (await request(t.http).post('/api/kitchens').set(lead.auth).send({ name: 'Far kitchen' }))
        .body as {
        id: string;
      };
      const res = await request(t.http)
        .post(`/api/kitchens/${kitchen.id}/invites`)
        .set(lead.auth)
        .send({ email: 'someone@example.test' })
        .expect(201);
      expect((res.body as CreatedInviteView).emailedTo).toBe('someone@example.test');
    } finally {
      await t.close();
    }
  });

  it('has no /api/dev/mail unless the loopback catcher runs', async () => {
    const t = await startTestApp();
    try {
      await request(t.http).get('/api/dev/mail').expect(404);
    } finally {
      await t.close();
    }
  });

  it('lists what the in-process catcher caught at /api/dev/mail, newest first', async () => {
    const t = await startTestApp({ MAIL_CATCHER: 'true' });
    try {
      const lead = await registerPerson(t.http, 'Lead');
      const kitchen = (await request(t.http).post('/api/kitchens').set(lead.auth).send({ name: 'Dev kitchen' }))
        .body as {
        id: string;
      };
      const invite = (
        await request(t.http)
          .post(`/api/kitchens/${kitchen.id}/invites`)
          .set(lead.auth)
          .set('Origin', 'http://192.168.1.20:5173')
          .send({ email: 'dev@example.test' })
          .expect(201)
      ).body as CreatedInviteView;
      let listed: { to: string[]; subject: string; text: string; links: string[]; at: string }[] = [];
      for (let i = 0; i < 100 && listed.length === 0; i++) {
        listed = (await request(t.http).get('/api/dev/mail').expect(200)).body as typeof listed;
        if (listed.length === 0) await new Promise((r) => setTimeout(r, 50));
      }
      expect(listed).toHaveLength(1);
      expect(listed[0]).toMatchObject({ to: ['dev@example.test'], subject: 'Join Dev kitchen on Jarday' });
      // No PUBLIC_URL: the link goes back to the page the lead was on.
      expect(listed[0]!.links).toEqual([`http://192.168.1.20:5173/join/${invite.code.replace('-', '')}`]);
      expect(Number.isNaN(Date.parse(listed[0]!.at))).toBe(false);
      // Only for this machine: through a proxy on loopback, a client elsewhere is not shown the caught links.
      await request(t.http).get('/api/dev/mail').set('X-Forwarded-For', '192.168.1.20').expect(404);
    } finally {
      await t.close();
    }
  });
});
