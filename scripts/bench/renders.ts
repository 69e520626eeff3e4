/**
 * Renders per second on the Counter board during a countdown, counted by React's <Profiler> in a profiling build
 * (`vite build --mode profile`): how often the whole board renders, against the ticking digits alone.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';
import type { DayView, KitchenView, LoadView, RecipeView, SessionView } from '@jarday/contracts';
import { chromium } from 'playwright-core';
import { io } from 'socket.io-client';
import { api, ROOT, sleep, SERVER_MAIN, startProcess } from './support.js';

const SECONDS = 10;

export async function benchRenders(): Promise<Record<string, string>> {
  const dir = mkdtempSync(join(tmpdir(), 'jarday-renders-'));
  const web = join(dir, 'web');
  execFileSync('npx', ['vite', 'build', '--mode', 'profile', '--outDir', web, '--emptyOutDir'], {
    cwd: ROOT,
    stdio: 'ignore',
  });
  const env = { DATABASE_PATH: join(dir, 'jarday.sqlite'), DEMO_MODE: 'true', WEB_DIST_PATH: web, NODE_ENV: 'test' };
  execFileSync('npx', ['tsx', 'seeds/load.ts'], { cwd: ROOT, env: { ...process.env, ...env }, stdio: 'ignore' });
  const server = await startProcess([SERVER_MAIN], env, async (url) => (await fetch(`${url}/api/health`)).ok);
  const base = server.url;

  // A day with a load processing: the board shows its countdown.
  const session = await api<SessionView>(base, '/api/auth/sign-in', null, {
    email: 'maren@quarryhill.test',
    password: 'demo-lead-pass',
  });
  const token = session.accessToken;
  const [kitchen] = await api<KitchenView[]>(base, '/api/kitchens', token);
  const k = kitchen!.id;
  const jam = (await api<RecipeView[]>(base, `/api/kitchens/${k}/recipes`, token)).find((r) => r.category === 'jam')!;
  const canner = (await api<{ id: string; method: string }[]>(base, `/api/kitchens/${k}/canners`, token)).find(
    (c) => c.method === 'boiling-water',
  )!;
  const day = await api<DayView>(base, `/api/kitchens/${k}/days`, token, { date: '2026-08-04', title: 'Render count' });
  const batch = await api<{ id: string }>(base, `/api/kitchens/${k}/days/${day.id}/batches`, token, {
    recipeId: jam.id,
    jarSize: 'half-pint',
    pack: 'hot',
    jars: 6,
  });
  const load = await api<LoadView>(base, `/api/kitchens/${k}/days/${day.id}/loads`, token, {
    batchId: batch.id,
    cannerId: canner.id,
    jars: 6,
  });
  const socket = io(base, { path: '/socket.io', transports: ['websocket'], auth: { token, deviceId: 'render-bench' } });
  await new Promise<void>((r) => socket.once('connect', () => r()));
  const joined = (await socket.emitWithAck('day:join', { dayId: day.id })) as {
    data: { snapshot: { timers: { id: string; loadId: string | null }[] } };
  };
  const timerId = joined.data.snapshot.timers.find((t) => t.loadId === load.id)!.id;
  for (const type of ['water-heating', 'rolling-boil']) {
    await socket.emitWithAck('timer:command', { commandId: randomUUID(), dayId: day.id, timerId, command: { type } });
  }
  await socket.emitWithAck('timer:start', {
    commandId: randomUUID(),
    dayId: day.id,
    timer: { kind: 'simmer', label: 'Jam simmer', durationMs: 600_000, startNow: true },
  });

  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  try {
    const page = await (await browser.newContext({ viewport: { width: 1024, height: 768 } })).newPage();
    await page.goto(`${base}/sign-in`);
    await page.getByRole('button', { name: /Maren Okafor/ }).click();
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.waitForURL(/\/kitchens/);
    await page.goto(`${base}/kitchens/${k}/days/${day.id}/board`);
    await page.getByTestId('countdown').first().waitFor();
    await sleep(2000);
    await page.evaluate(() => ((globalThis as { __jardayRenders?: object }).__jardayRenders = {}));
    await sleep(SECONDS * 1000);
    const counts = await page.evaluate(
      () => (globalThis as { __jardayRenders?: Record<string, number> }).__jardayRenders ?? {},
    );
    const rate = (n: number | undefined) => `${((n ?? 0) / SECONDS).toFixed(1)} /s`;
    const digits = await page.getByTestId('countdown').count();
    return {
      'countdowns on the board': String(digits),
      'Countdown renders (all countdowns together)': rate(counts.Countdown),
      'CounterBoard renders (the whole board)': rate(counts.CounterBoard),
      'React commits touching the board (<Profiler id="board">)': rate(counts['commits:board']),
    };
  } finally {
    await browser.close();
    socket.disconnect();
    await server.stop();
  }
}
