import type { SessionView } from '@jarday/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { refreshCookie, registerPerson, startTestApp, type TestApp } from './support/test-app.js';

describe('sign-in (e2e, fresh SQLite file)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' });
  });
  afterAll(() => t.close());

  it('registers, reads the current user, refreshes with rotation and signs out', async () => {
    const res = await request(t.http)
      .post('/api/auth/register')
      .send({ email: '  Maren@Example.TEST ', name: 'Maren', password: 'a long enough password' })
      .expect(201);
    const session = res.body as SessionView;
    expect(session.user).toMatchObject({ email: 'maren@example.test', name: 'Maren' });
    expect(session.user).not.toHaveProperty('passwordHash');
    const setCookie = (res.headers['set-cookie'] as unknown as string[])[0]!;
    expect(setCookie).toMatch(/HttpOnly/i);
    expect(setCookie).toMatch(/SameSite=Strict/i);
    expect(setCookie).toMatch(/Path=\/api\/auth/);
    const cookie = refreshCookie(res);

    const me = await request(t.http)
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${session.accessToken}`)
      .expect(200);
    expect(me.body).toMatchObject({ id: session.user.id, email: 'maren@example.test' });

    const refreshed = await request(t.http).post('/api/auth/refresh').set('Cookie', cookie).expect(200);
    const nextCookie = refreshCookie(refreshed);
    expect(nextCookie).not.toBe(cookie);
    // The old refresh token was rotated away and works no more.
    const replay = await request(t.http).post('/api/auth/refresh').set('Cookie', cookie).expect(401);
    expect(replay.body).toMatchObject({ code: 'session_expired' });

    await request(t.http).post('/api/auth/sign-out').set('Cookie', nextCookie).expect(204);
    await request(t.http).post('/api/auth/refresh').set('Cookie', nextCookie).expect(401);
  });

  it('signs in with the right password only, without saying which part was wrong', async () => {
    await request(t.http)
      .post('/api/auth/register')
      .send({ email: 'teo@example.test', name: 'Teo', password: 'another long password' })
      .expect(201);
    const ok = await request(t.http)
      .post('/api/auth/sign-in')
      .send({ email: 'TEO@example.test', password: 'another long password' })
      .expect(200);
    expect((ok.body as SessionView).user.name).toBe('Teo');

    const wrongPassword = await request(t.http)
      .post('/api/auth/sign-in')
      .send({ email: 'teo@example.test', password: 'not the password' })
      .expect(401);
    const unknownEmail = await request(t.http)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@example.test', password: 'not the password' })
      .expect(401);
    expect(wrongPassword.body).toEqual(unknownEmail.body);
    expect(wrongPassword.body).toEqual({
      statusCode: 401,
      code: 'invalid_credentials',
      message: 'E-mail or password is incorrect',
    });
  });

  it('refuses a duplicate e-mail with 409, whatever its case', async () => {
    await request(t.http)
      .post('/api/auth/register')
      .send({ email: 'dup@example.test', name: 'A', password: 'password one two' })
      .expect(201);
    const res = await request(t.http)
      .post('/api/auth/register')
      .send({ email: 'DUP@example.test', name: 'B', password: 'password one two' })
      .expect(409);
    expect(res.body).toMatchObject({ code: 'email_taken', issues: [{ path: 'email' }] });
  });

  it('refuses forged, expired-looking and missing tokens', async () => {
    await request(t.http).get('/api/auth/me').expect(401);
    await request(t.http).get('/api/auth/me').set('Authorization', 'Bearer not.a.jwt').expect(401);
    const person = await registerPerson(t.http);
    const [h, p] = person.token.split('.');
    const forged = `${h}.${p}.${'A'.repeat(43)}`;
    await request(t.http).get('/api/auth/me').set('Authorization', `Bearer ${forged}`).expect(401);
    await request(t.http).post('/api/auth/refresh').expect(401);
  });

  it('stores only a scrypt hash of the password', async () => {
    const person = await registerPerson(t.http);
    const { openDatabase } = await import('../src/db/database.js');
    const db = openDatabase(`${t.dir}/jarday.sqlite`);
    const row = db.$client.prepare('select password_hash from users where id = ?').get(person.user.id) as {
      password_hash: string;
    };
    db.$client.close();
    expect(row.password_hash).toMatch(/^scrypt\$32768\$8\$1\$/);
    expect(row.password_hash).not.toContain('correct horse battery');
  });
});

describe('sign-in throttling (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '3', SIGNIN_THROTTLE_TTL_SECONDS: '60' });
  });
  afterAll(() => t.close());

  it('answers 429 after the limit for one e-mail, and leaves other accounts alone', async () => {
    const attempt = (email: string) =>
      request(t.http).post('/api/auth/sign-in').send({ email, password: 'guess guess guess' });
    for (let i = 0; i < 3; i++) expect((await attempt('target@example.test')).status).toBe(401);
    const blocked = await attempt('target@example.test');
    expect(blocked.status).toBe(429);
    expect(blocked.body).toMatchObject({ code: 'too_many_attempts' });
    expect((await attempt('neighbour@example.test')).status).toBe(401);
  });
});
