import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { registerPerson, startTestApp, type TestApp } from './support/test-app.js';

describe('errors at the edge (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000', BODY_LIMIT_BYTES: '2048' });
  });
  afterAll(() => t.close());

  it('malformed JSON is a 400 that says so', async () => {
    const res = await request(t.http)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send('{"email": "a@');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ statusCode: 400, code: 'bad_json', message: 'The request body is not valid JSON' });
  });

  it('validation names each bad field', async () => {
    const res = await request(t.http)
      .post('/api/auth/register')
      .send({ email: 'not-an-email', name: '', password: 'short' });
    expect(res.status).toBe(400);
    const body = res.body as { code: string; issues: { path: string; message: string }[] };
    expect(body.code).toBe('validation_failed');
    expect(body.issues.map((i) => i.path).sort()).toEqual(['email', 'name', 'password']);
    expect(body.issues.find((i) => i.path === 'password')?.message).toBe('Use at least 10 characters');
  });

  it('unknown fields are refused rather than silently dropped', async () => {
    const res = await request(t.http)
      .post('/api/auth/register')
      .send({ email: 'x@example.test', name: 'X', password: 'long enough pass', role: 'admin' });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain('role');
  });

  it('an oversized body is a 413', async () => {
    const res = await request(t.http)
      .post('/api/auth/sign-in')
      .send({ email: 'a@example.test', password: 'x'.repeat(5000) });
    expect(res.status).toBe(413);
    expect(res.body).toMatchObject({ code: 'payload_too_large' });
  });

  it('bad nested kitchen settings name the field', async () => {
    const p = await registerPerson(t.http);
    const res = await request(t.http)
      .post('/api/kitchens')
      .set(p.auth)
      .send({ name: 'K', altitude: { value: 99999, unit: 'ft' } });
    expect(res.status).toBe(400);
    expect((res.body as { issues: { path: string }[] }).issues[0]?.path).toBe('altitude.value');
    const gauge = await request(t.http)
      .post('/api/kitchens')
      .set(p.auth)
      .send({ name: 'K' })
      .expect(201)
      .then((k) =>
        request(t.http)
          .post(`/api/kitchens/${(k.body as { id: string }).id}/canners`)
          .set(p.auth)
          .send({ name: 'P', method: 'pressure', capacity: { quart: 7 } }),
      );
    expect(gauge.status).toBe(400);
    expect((gauge.body as { issues: { path: string }[] }).issues[0]?.path).toBe('gauge');
  });

  it('an unknown API route is a JSON 404 and no stack trace leaks', async () => {
    const res = await request(t.http).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body).toMatchObject({ statusCode: 404, code: 'not_found' });
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(js|ts):\d+/);
  });

  it('health reports the database', async () => {
    const res = await request(t.http).get('/api/health').expect(200);
    expect(res.body).toMatchObject({ status: 'ok', database: 'up', demoMode: false });
  });

  it('serves the OpenAPI document, with the zod bodies in it', async () => {
    const res = await request(t.http).get('/api/docs-json').expect(200);
    const doc = res.body as { paths: Record<string, Record<string, { requestBody?: unknown }>> };
    expect(Object.keys(doc.paths)).toContain('/api/kitchens/{kitchenId}/canners');
    expect(JSON.stringify(doc.paths['/api/auth/register']?.post?.requestBody)).toContain('password');
    await request(t.http).get('/api/docs').expect(200);
  });
});
