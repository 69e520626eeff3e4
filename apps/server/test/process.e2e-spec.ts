import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServerProcess, type ServerProcess } from './support/server-process.js';

describe('the built server as a process', () => {
  let dir: string;
  let server: ServerProcess;

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'jarday-proc-'));
    const web = join(dir, 'web');
    mkdirSync(join(web, 'assets'), { recursive: true });
    writeFileSync(join(web, 'index.html'), '<!doctype html><title>Jarday test shell</title>');
    writeFileSync(join(web, 'assets', 'app.js'), 'console.log("jarday")');
    server = await startServerProcess({ DATABASE_PATH: join(dir, 'db', 'jarday.sqlite'), WEB_DIST_PATH: web });
  });
  afterAll(async () => {
    await server?.stop();
    rmSync(dir, { recursive: true, force: true });
  });

  it('answers /, client routes and assets from the web build, but never /api', async () => {
    for (const path of ['/', '/kitchens/some-id/settings', '/join/ABCD2345']) {
      const res = await fetch(server.url + path);
      expect(res.status, path).toBe(200);
      expect(await res.text()).toContain('Jarday test shell');
    }
    const asset = await fetch(`${server.url}/assets/app.js`);
    expect(await asset.text()).toContain('jarday');
    const api = await fetch(`${server.url}/api/unknown`);
    expect(api.status).toBe(404);
    expect(api.headers.get('content-type')).toMatch(/json/);
  });

  it('serves GET /api/health', async () => {
    const res = await fetch(`${server.url}/api/health`);
    expect(await res.json()).toMatchObject({ status: 'ok', database: 'up' });
  });

  it('generated a JWT secret once and kept it in the data folder', async () => {
    const { readFileSync } = await import('node:fs');
    expect(readFileSync(join(dir, 'db', 'jwt-secret'), 'utf8').trim().length).toBeGreaterThanOrEqual(32);
  });
});

describe('refusing to boot on bad settings', () => {
  it.each([
    [{ PORT: 'soup' }, 'PORT'],
    [{ NODE_ENV: 'production' }, 'JWT_SECRET'],
    [{ DEMO_MODE: 'perhaps' }, 'DEMO_MODE'],
  ])('%o stops the app with a message naming %s', async (env, setting) => {
    const server = await startServerProcess({ DATABASE_PATH: join(tmpdir(), 'jarday-never.sqlite'), ...env }, false);
    const code = await server.exited;
    expect(code).toBe(1);
    expect(server.output()).toContain('Jarday cannot start: invalid settings');
    expect(server.output()).toMatch(new RegExp(`^  ${setting}:`, 'm'));
    expect(server.output()).not.toMatch(/\n\s+at .*\.js:\d+/);
  });
});
