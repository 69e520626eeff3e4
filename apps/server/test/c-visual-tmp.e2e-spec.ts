import request from 'supertest';
import sharp from 'sharp';
import { chromium } from 'playwright-core';
import { afterAll, beforeAll, it, vi } from 'vitest';
import http from 'node:http';
import { existsSync, readFileSync } from 'node:fs';
import { extname, join } from 'node:path';
const TYPES: Record<string, string> = { '.js': 'text/javascript', '.css': 'text/css', '.html': 'text/html', '.woff2': 'font/woff2', '.svg': 'image/svg+xml', '.wav': 'audio/wav', '.png': 'image/png' };
let front: http.Server;
let base = '';
import type { LotView } from '@jarday/contracts';
import { addLoad, canningDay, HOUR, liftLoad } from './support/lifted-load.js';
import { kitchenWithCrew, startTestApp, type TestApp } from './support/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({ SIGNIN_THROTTLE_LIMIT: '1000' }, true);
  const api = new URL(t.url);
  front = http.createServer((req, res) => {
    const url = req.url ?? '/';
    if (url.startsWith('/api') || url.startsWith('/socket.io')) {
      const up = http.request({ host: api.hostname, port: api.port, path: url, method: req.method, headers: req.headers }, (r) => {
        res.writeHead(r.statusCode ?? 500, r.headers);
        r.pipe(res);
      });
      req.pipe(up);
      return;
    }
    const file = join('/tmp/c-web', url.split('?')[0]!);
    const path = existsSync(file) && extname(file) ? file : '/tmp/c-web/index.html';
    res.writeHead(200, { 'Content-Type': TYPES[extname(path)] ?? 'application/octet-stream' });
    res.end(readFileSync(path));
  });
  await new Promise<void>((r) => front.listen(0, '127.0.0.1', r));
  base = `http://127.0.0.1:${(front.address() as { port: number }).port}`;
});
afterAll(async () => { front.close(); await t.close(); });

it('shoots', async () => {
  const crew = await kitchenWithCrew(t.http);
  const k = crew.kitchen.id;
  const lifted = new Date(Date.now() - 3 * 24 * HOUR);
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(lifted);
  const day = await canningDay(t.http, k, crew.lead, { date: '2026-08-15' });
  const load = await addLoad(t.http, k, crew.lead, day, 0, 6);
  await liftLoad(t, crew.helper, day.dayId, load.id);
  vi.setSystemTime(new Date(lifted.getTime() + 12 * HOUR));
  await request(t.http).post(`/api/kitchens/${k}/loads/${load.id}/bands-off`).set(crew.helper.auth).send({}).expect(200);
  await request(t.http).put(`/api/kitchens/${k}/loads/${load.id}/seal-checks`).set(crew.helper.auth)
    .send({ jars: [1, 2, 3, 4, 5, 6].map((j) => ({ jarNumber: j, result: 'sealed', outcome: 'store' })) }).expect(200);
  vi.useRealTimers();
  const lot = ((await request(t.http).get(`/api/kitchens/${k}/lots`).set(crew.lead.auth)).body as LotView[])[0]!;
  for (const [w, h, c] of [[800, 600, [200, 120, 40]], [600, 800, [60, 140, 90]], [700, 500, [180, 40, 40]]] as const) {
    const png = await sharp({ create: { width: w, height: h, channels: 3, background: { r: c[0], g: c[1], b: c[2] } } }).png().toBuffer();
    await request(t.http).post(`/api/kitchens/${k}/attachments`).set(crew.helper.auth).field('subject', 'day').field('subjectId', day.dayId).attach('file', png, `jars-${w}.png`).expect(201);
  }
  const pdfRes = await request(t.http).get(`/api/kitchens/${k}/lots/${lot.id}/labels.pdf`).set(crew.lead.auth).buffer(true).expect(200);
  const m = /\/r\/([A-Za-z0-9_-]+-1-1)/.exec((pdfRes.body as Buffer).toString('latin1'));
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox'] });
  for (const [name, size, touch] of [['phone', { width: 390, height: 844 }, true], ['tablet', { width: 1024, height: 768 }, false]] as const) {
    const ctx = await browser.newContext({ viewport: size, hasTouch: touch, isMobile: touch });
    const page = await ctx.newPage();
    await page.goto(`${base}/sign-in?next=/kitchens/${k}/days/${day.dayId}`);
    await page.getByLabel('E-mail').fill(crew.helper.user.email);
    await page.getByLabel('Password', { exact: true }).fill('correct horse battery');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('img', { name: 'jars-800.png' }).waitFor();
    await page.getByRole('region', { name: 'Photos and documents' }).screenshot({ path: `/tmp/c-panel-${name}.png` });
    await page.screenshot({ path: `/tmp/c-day-${name}.png`, fullPage: true });
    const anon = await (await browser.newContext({ viewport: size, hasTouch: touch, isMobile: touch })).newPage();
    await anon.goto(`${base}/r/${m ? m[1] : 'x'}`);
    await anon.getByRole('heading', { level: 1 }).waitFor();
    await anon.screenshot({ path: `/tmp/c-record-${name}.png`, fullPage: true });
    await page.goto(`${base}/r/${m ? m[1] : 'x'}`);
    await page.getByRole('link', { name: /Open lot/ }).waitFor();
    await page.screenshot({ path: `/tmp/c-record-member-${name}.png`, fullPage: true });
  }
  await browser.close();
}, 120_000);
