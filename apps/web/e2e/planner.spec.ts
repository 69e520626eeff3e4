import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { device, PHONE, snap, TABLET } from './support.js';

/** Serious and critical accessibility findings (axe-core, WCAG 2 A and AA rules). */
async function accessibilityProblems(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21aa']).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

/** Signs in as the demo kitchen's invented lead and opens the Day planner from the canning days list. */
async function openPlanner(page: Page) {
  await page.goto('/sign-in');
  await page.getByRole('button', { name: /Use demo account Maren Okafor/ }).click();
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page
    .getByRole('link', { name: /Quarry Hill Kitchen/ })
    .first()
    .click();
  await expect(page).toHaveURL(/\/kitchens\/[0-9a-f-]+$/);
  await page.goto(`${page.url()}/days`);
  await page.getByRole('link', { name: 'Plan a day' }).click();
  await expect(page.getByRole('heading', { name: 'Plan a canning day' })).toBeVisible();
}

async function choose(page: Page, field: string, option: RegExp) {
  await page.getByRole('combobox', { name: field }).click();
  await page.getByRole('option', { name: option }).click();
}

async function planTomatoes(page: Page) {
  await choose(page, 'Recipe 1', /Whole or halved tomatoes in water/);
  await choose(page, 'Jars and pack 1', /Pint.*hot pack/i);
  await page.getByLabel('Jars 1').fill('18');
  await expect(page.getByRole('heading', { name: 'The plan' })).toBeVisible();
}

test('a lead plans 18 pints of tomatoes, sees the learned come-up and the timeline, and starts the day', async ({
  browser,
}) => {
  const tablet = await device(browser, TABLET);
  const page = await tablet.newPage();
  await openPlanner(page);
  await planTomatoes(page);

  // The demo's water-bath canner has logged come-ups (seeds/history.ts): the planner says it learned them.
  await expect(
    page.getByText(/Speckled water-bath canner: \d+ min · learned from \d+ logged loads: median \d+ min/),
  ).toBeVisible();
  // Quarry Hill Kitchen is at 2,350 ft: pints of whole tomatoes take 45 min there (USDA Guide 3, confirmed).
  await expect(page.getByText('Load 1 · Speckled water-bath canner · 9 pint jars')).toBeVisible();
  await expect(page.getByText('Load 2 · Speckled water-bath canner · 9 pint jars')).toBeVisible();
  await expect(page.getByText(/Whole or halved tomatoes in water: 45 min at 2,350 ft/).first()).toBeVisible();
  await expect(page.getByText('Start heating the canner water', { exact: true })).toBeVisible();
  await expect(page.getByRole('list', { name: 'Steps of the day' })).toContainText('Bands may come off');
  await snap(page, 'planner-tablet-1-plan');
  expect(await accessibilityProblems(page)).toEqual([]);

  // Only the pressure canner: tomatoes have a tested boiling-water time only, so the plan is refused.
  await page.getByRole('checkbox', { name: 'Speckled water-bath canner' }).uncheck();
  await page.getByRole('checkbox', { name: 'Tall pressure canner' }).check();
  await expect(page.getByText('This plan cannot be processed safely as chosen')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Start this day' })).toHaveCount(0);
  await snap(page, 'planner-tablet-2-refused');

  await page.getByRole('checkbox', { name: 'Tall pressure canner' }).uncheck();
  await page.getByRole('checkbox', { name: 'Speckled water-bath canner' }).check();
  await page.getByLabel('Name of the day').fill('Planned tomatoes');
  await page.getByRole('button', { name: 'Start this day' }).click();
  await expect(page).toHaveURL(/\/days\/[0-9a-f-]+\/board$/);
  await expect(page.getByText(/Load 2/).first()).toBeVisible();
  await snap(page, 'planner-tablet-3-board');
  await tablet.close();
});

test('the planner on a phone, planned by produce weight', async ({ browser }) => {
  const phone = await device(browser, PHONE, true);
  const page = await phone.newPage();
  await openPlanner(page);
  await choose(page, 'Recipe 1', /Whole or halved tomatoes in water/);
  await page.getByRole('button', { name: 'Produce weight' }).click();
  await page.getByLabel('Produce 1 (lb)').fill('26');
  // 13 lb fills 9 pints (USDA Guide 3, confirmed): 26 lb is 18 pints.
  await expect(page.getByText('18 pint jars')).toBeVisible();
  await snap(page, 'planner-phone-1-plan');
  expect(await accessibilityProblems(page)).toEqual([]);
  await phone.close();
});
