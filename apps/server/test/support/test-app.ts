import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { SessionView } from '@jarday/contracts';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import request from 'supertest';
import type { App } from 'supertest/types.js';
import { AppModule } from '../../src/app.module.js';
import { configureApp } from '../../src/app.setup.js';

export interface TestApp {
  app: NestExpressApplication;
  http: App;
  dir: string;
  /** Set when started with `listen`: the base URL for real socket.io clients. */
  url: string;
  close: () => Promise<void>;
}

/** The whole app on a fresh SQLite file in a temporary folder, with the real migrations applied at boot. */
export async function startTestApp(env: Record<string, string> = {}, listen = false): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'jarday-e2e-'));
  const moduleRef = await Test.createTestingModule({
    imports: [
      AppModule.forRoot({
        NODE_ENV: 'test',
        DATABASE_PATH: join(dir, 'jarday.sqlite'),
        WEB_DIST_PATH: join(dir, 'no-web-build'),
        ...env,
      }),
    ],
  }).compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>({ bodyParser: false, logger: false });
  configureApp(app);
  await app.init();
  let url = '';
  if (listen) {
    await app.listen(0, '127.0.0.1');
    url = await app.getUrl();
  }
  return {
    app,
    http: app.getHttpServer() as App,
    dir,
    url,
    close: async () => {
      await app.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export interface Person {
  user: SessionView['user'];
  token: string;
  /** The Set-Cookie refresh cookie, ready to send back as a Cookie header. */
  cookie: string;
  auth: { Authorization: string };
}

let counter = 0;
/** Registers a new person with a unique e-mail. */
export async function registerPerson(http: App, name = 'Test Person'): Promise<Person> {
  counter += 1;
  const email = `person${counter}-${Date.now()}@kitchen.test`;
  const res = await request(http)
    .post('/api/auth/register')
    .send({ email, name, password: 'correct horse battery' })
    .expect(201);
  const body = res.body as SessionView;
  return {
    user: body.user,
    token: body.accessToken,
    cookie: refreshCookie(res),
    auth: { Authorization: `Bearer ${body.accessToken}` },
  };
}

export function refreshCookie(res: request.Response): string {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  const cookie = raw?.find((c) => c.startsWith('jarday_refresh='));
  if (!cookie) throw new Error('no refresh cookie in the answer');
  return cookie.split(';')[0]!;
}

/** A kitchen with a lead, a helper and a watcher who joined through invites, plus an outsider with a kitchen of their own. */
export async function kitchenWithCrew(http: App) {
  const lead = await registerPerson(http, 'Lead');
  const helper = await registerPerson(http, 'Helper');
  const watcher = await registerPerson(http, 'Watcher');
  const outsider = await registerPerson(http, 'Outsider');
  const kitchen = (
    await request(http)
      .post('/api/kitchens')
      .set(lead.auth)
      .send({ name: 'Test kitchen', altitude: { value: 2100, unit: 'ft' } })
      .expect(201)
  ).body as { id: string };
  for (const [person, role] of [
    [helper, 'helper'],
    [watcher, 'watcher'],
  ] as const) {
    const invite = (
      await request(http).post(`/api/kitchens/${kitchen.id}/invites`).set(lead.auth).send({ role }).expect(201)
    ).body as { code: string };
    await request(http).post(`/api/invites/${invite.code}/redeem`).set(person.auth).expect(200);
  }
  const otherKitchen = (
    await request(http).post('/api/kitchens').set(outsider.auth).send({ name: 'Other kitchen' }).expect(201)
  ).body as { id: string };
  return { lead, helper, watcher, outsider, kitchen, otherKitchen };
}
