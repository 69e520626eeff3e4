import { expect, test, type Page } from '@playwright/test';
import { device, PHONE, snap, TABLET } from './support.js';

async function signInAsLead(page: Page) {
  await page.goto('/sign-in');
  await page.getByRole('button', { name: /Maren Okafor/ }).click();
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page
    .getByRole('link', { name: /Quarry Hill Kitchen/ })
    .last()
    .click();
}

async function choosePlan(page: Page) {
  await page.getByRole('combobox', { name: 'Jar size and pack' }).selectOption({ label: 'Pint jars, hot pack' });
  await page
    .getByRole('combobox', { name: 'Canner', exact: true })
    .selectOption({ label: 'Speckled water-bath canner (boiling water)' });
}

test('a lead copies a starter, edits its process table and sees the plan change', async ({ browser }) => {
  const tablet = await device(browser, TABLET);
  const page = await tablet.newPage();
  await signInAsLead(page);
  await page.getByRole('link', { name: /Recipe box/ }).click();
  await snap(page, 'recipes-tablet-1-box');

  await page.getByRole('button', { name: 'Copy to my kitchen: Whole or halved tomatoes in water' }).click();
  await expect(page.getByRole('heading', { name: 'Whole or halved tomatoes in water', level: 1 })).toBeVisible();

  // Quarry Hill Kitchen is at 2,350 ft: USDA Guide 3 gives 45 minutes for pints in the 1,001-3,000 ft band.
  await choosePlan(page);
  await expect(page.getByRole('status', { name: 'Process time' })).toHaveText('45 minutes');
  await snap(page, 'recipes-tablet-2-recipe-plan');

  await page.getByRole('link', { name: 'Edit' }).click();
  const cell = page.getByLabel('Minutes for pint jars, hot pack at 1,001–3,000 ft');
  await expect(cell).toHaveValue('45');
  await cell.fill('48');
  await expect(page.getByText('Saving changed times marks this recipe untested')).toBeVisible();
  await snap(page, 'recipes-tablet-3-editor');
  await page.getByRole('button', { name: 'Save recipe' }).click();

  await expect(page.getByText('Saved, and now marked untested')).toBeVisible();
  await expect(page.getByText('Not a tested recipe').first()).toBeVisible();
  await choosePlan(page);
  await expect(page.getByRole('status', { name: 'Process time' })).toHaveText('48 minutes');
  await snap(page, 'recipes-tablet-4-untested');

  // The same recipe on a phone.
  const url = page.url();
  const phone = await device(browser, PHONE, true);
  const small = await phone.newPage();
  await signInAsLead(small);
  await small.goto(new URL(url).pathname);
  await expect(small.getByText('Not a tested recipe').first()).toBeVisible();
  await snap(small, 'recipes-phone-1-recipe');
  await tablet.close();
  await phone.close();
});
