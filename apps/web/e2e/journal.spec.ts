import { readFileSync } from 'node:fs';
import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { parse } from 'csv-parse/sync';
import { device, PHONE, snap, TABLET } from './support.js';

/** Serious and critical accessibility findings (axe-core, WCAG 2 A and AA rules). */
async function accessibilityProblems(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21aa']).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

/** The demo seed's "yesterday" (seeds/demo-kitchen.json): four loads, the third with a lead's override of the rest. */
const YESTERDAY = 'Tomatoes, jam and pickles';
const OVERRIDE_REASON = 'Jam scorching on the next burner, so the jars came out early to free the stove';

async function signInToKitchen(page: Page, who: string) {
  await page.goto('/sign-in');
  await page.getByRole('button', { name: new RegExp(`Use demo account ${who}`) }).click();
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page
    .getByRole('link', { name: /Quarry Hill Kitchen/ })
    .first()
    .click();
}

test("from the kitchen home, yesterday's day: timeline, summary, a load's entries and the CSV", async ({ browser }) => {
  const context = await device(browser, TABLET);
  const page = await context.newPage();
  await signInToKitchen(page, 'Maren Okafor');

  await expect(page.getByRole('link', { name: new RegExp(`Yesterday's day: ${YESTERDAY}`) })).toBeVisible();
  await snap(page, 'journal-tablet-0-kitchen-home');
  await page.getByRole('link', { name: new RegExp(`Yesterday's day: ${YESTERDAY}`) }).click();
  await expect(page.getByRole('heading', { level: 1, name: `Journal: ${YESTERDAY}` })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Timeline' })).toBeVisible();
  await expect(page.getByTestId('timeline-chart').locator('svg').first()).toBeVisible();
  await expect(page.getByText('4 of 4')).toBeVisible(); // loads processed
  await expect(page.getByRole('alert').filter({ hasText: OVERRIDE_REASON })).toBeVisible();
  await snap(page, 'journal-tablet-1-yesterday');
  expect(await accessibilityProblems(page)).toEqual([]);

  const entries = page.getByRole('list', { name: 'Journal entries' });
  const all = await entries.getByRole('listitem').count();
  await page.getByRole('button', { name: 'Load 3: Hot-packed jam' }).click();
  await expect(page.getByRole('button', { name: 'Load 3: Hot-packed jam' })).toHaveAttribute('aria-pressed', 'true');
  await expect(page).toHaveURL(/loadId=/);
  await expect.poll(() => entries.getByRole('listitem').count()).toBeLessThan(all);
  for (const text of await entries.getByRole('listitem').allInnerTexts()) expect(text).toContain('Load 3');
  await expect(entries.getByText(/Safety override: Load 3: rest in the open canner/)).toBeVisible();
  await snap(page, 'journal-tablet-2-load-3');

  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Download CSV' }).click(),
  ]);
  expect(download.suggestedFilename()).toMatch(/^jarday-\d{4}-\d{2}-\d{2}-journal\.csv$/);
  const csv = readFileSync(await download.path(), 'utf8');
  const rows: string[][] = parse(csv, { record_delimiter: '\r\n' });
  expect(rows[0]).toEqual(['seq', 'at', 'actor', 'device', 'kind', 'station', 'load', 'detail']);
  expect(rows.length - 1).toBe(all);
  expect(rows.find((r) => r[4] === 'timer.override')?.[7]).toContain(OVERRIDE_REASON);
  await context.close();
});

test('a watcher on a phone reads the days list with each past day and its journal', async ({ browser }) => {
  const context = await device(browser, PHONE, true);
  const page = await context.newPage();
  await signInToKitchen(page, 'Priya Lind');
  await page.getByRole('link', { name: /Canning days/ }).click();
  const past = page.getByRole('region', { name: 'Past days' });
  await expect(past.getByRole('heading', { name: YESTERDAY })).toBeVisible();
  await expect(past.getByText(/4 of 4 loads processed · 35 jars/).first()).toBeVisible();
  await expect(past.getByText(/seal rate 90%/)).toBeVisible();
  await snap(page, 'journal-phone-1-days');
  expect(await accessibilityProblems(page)).toEqual([]);
  await past.getByRole('link', { name: `Journal: ${YESTERDAY}` }).click();
  await expect(page.getByRole('heading', { name: 'Summary' })).toBeVisible();
  await expect(page.getByTestId('timeline-chart').locator('svg').first()).toBeVisible();
  await snap(page, 'journal-phone-2-journal');
  expect(await accessibilityProblems(page)).toEqual([]);
  await context.close();
});
