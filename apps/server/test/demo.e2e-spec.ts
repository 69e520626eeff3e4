import type { KitchenView, SessionView } from '@jarday/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadSeed, readSeed } from '../../../seeds/load.js';
import { openDatabase } from '../src/db/database.js';
import { startTestApp, type TestApp } from './support/test-app.js';

describe('demo data (e2e)', () => {
  let t: TestApp;
  const seed = readSeed();

  beforeAll(async () => {
    t = await startTestApp({ DEMO_MODE: 'true' });
    const db = openDatabase(`${t.dir}/jarday.sqlite`);
    expect(await loadSeed(db, seed)).toBe(true);
    // A second load finds people and writes nothing.
    expect(await loadSeed(db, seed)).toBe(false);
    db.$client.close();
  });
  afterAll(() => t.close());

  it('is a kitchen above 1,000 ft with a lead, a helper and a watcher', () => {
    const ft = seed.kitchen.altitude.unit === 'ft' ? seed.kitchen.altitude.value : seed.kitchen.altitude.value / 0.3048;
    expect(ft).toBeGreaterThan(1000);
    expect(seed.people.map((p) => p.role).sort()).toEqual(['helper', 'lead', 'watcher']);
  });

  it('lists the demo accounts in demo mode, and each one signs in to the kitchen with its role', async () => {
    const res = await request(t.http).get('/api/auth/demo-accounts').expect(200);
    const { demoMode, accounts } = res.body as {
      demoMode: boolean;
      accounts: { email: string; password: string; role: string }[];
    };
    expect(demoMode).toBe(true);
    expect(accounts).toHaveLength(3);
    for (const account of accounts) {
      const session = (
        await request(t.http)
          .post('/api/auth/sign-in')
          .send({ email: account.email, password: account.password })
          .expect(200)
      ).body as SessionView;
      const kitchens = (
        await request(t.http).get('/api/kitchens').set('Authorization', `Bearer ${session.accessToken}`).expect(200)
      ).body as KitchenView[];
      expect(kitchens).toHaveLength(1);
      expect(kitchens[0]).toMatchObject({ name: seed.kitchen.name, role: account.role, memberCount: 3 });
      const box = (
        await request(t.http)
          .get(`/api/kitchens/${kitchens[0]!.id}/recipes`)
          .set('Authorization', `Bearer ${session.accessToken}`)
          .expect(200)
      ).body as { copiedFrom: string; tested: boolean }[];
      expect(box.map((r) => r.copiedFrom).sort()).toEqual([...seed.recipes].sort());
    }
  });
});

describe('demo accounts outside demo mode', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('lists none', async () => {
    const res = await request(t.http).get('/api/auth/demo-accounts').expect(200);
    expect(res.body).toEqual({ demoMode: false, accounts: [] });
  });
});
