import { readFile } from 'node:fs/promises';
import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Locator, type Page } from '@playwright/test';
import { device, PHONE, snap, TABLET } from './support.js';

/** Serious and critical accessibility findings (axe-core, WCAG 2 A and AA rules). */
async function accessibilityProblems(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21aa']).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

/** The demo scenario's invented people and its "yesterday" day (seeds/demo-kitchen.json, history). */
const LEAD = 'Maren Okafor';
const HELPER = 'Teo Vance';
const YESTERDAY = 'Tomatoes, jam and pickles';

async function signIn(page: Page, name: string) {
  await page.goto('/sign-in');
  await page.getByRole('button', { name: new RegExp(`Use demo account ${name}`) }).click();
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('link', { name: /Quarry Hill Kitchen/ }).first()).toBeVisible();
}

async function openShelf(page: Page): Promise<Locator> {
  await page
    .getByRole('link', { name: /Quarry Hill Kitchen/ })
    .first()
    .click();
  await page.getByRole('link', { name: /Cooling shelf & pantry/ }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Cooling shelf' })).toBeVisible();
  return page.getByRole('region', { name: new RegExp(`^${YESTERDAY} · `) });
}

const loadCard = (day: Locator, number: number) =>
  day.locator(`[data-testid="cooling-load"][data-load-number="${number}"]`);

test('after the canner: bands refused then off, seal checks, the lot in the pantry, a gift, the labels', async ({
  browser,
}) => {
  test.setTimeout(180_000);
  const tabletContext = await device(browser, TABLET);
  const tablet = await tabletContext.newPage();
  await signIn(tablet, LEAD);
  const day = await openShelf(tablet);

  // Yesterday's load 4 came out 5 hours ago: the server refuses its bands with the time still to wait.
  const gated = loadCard(day, 4);
  await expect(gated.getByTestId('load-times')).toHaveAttribute('data-stage', 'resting');
  await expect(gated.getByRole('timer')).toContainText(/Bands may come off in \d+ h/);
  await gated.getByRole('button', { name: 'Bands off: load 4' }).click();
  await expect(gated.getByTestId('bands-refusal')).toContainText(
    /^Leave the jars undisturbed: bands can come off in \d+ h( \d+ min)?, 12 hours after the jars came out\.$/,
  );
  await snap(tablet, 'after-canner-tablet-1-refused');

  // A lead could override, but only with a written reason and after the warning.
  await gated.getByRole('button', { name: 'Take them off early (lead)' }).click();
  const dialog = tablet.getByRole('dialog', { name: 'Take the bands off load 4 early?' });
  await expect(dialog.getByText('The jars have not cooled 12 hours')).toBeVisible();
  await dialog.getByRole('button', { name: 'Take the bands off early' }).click();
  await expect(dialog.getByText('Write the reason in a few words (at least 5 characters)')).toBeVisible();
  await snap(tablet, 'after-canner-tablet-2-override-dialog');
  await dialog.getByRole('button', { name: 'Keep them on' }).click();
  await expect(dialog).toBeHidden();
  await expect(gated.getByTestId('load-times')).toHaveAttribute('data-stage', 'resting');

  // Load 1 came out 17 hours ago: its bands come off, and its seven quarts are checked jar by jar.
  const ready = loadCard(day, 1);
  await expect(ready.getByTestId('load-times')).toHaveAttribute('data-stage', 'may-come-off');
  await ready.getByRole('button', { name: 'Bands off: load 1' }).click();
  await expect(ready.getByText(/^Bands off at /)).toBeVisible();
  await expect(ready.getByRole('button', { name: /^Jar \d: not checked$/ })).toHaveCount(7);
  const tile = (n: number) => ready.getByRole('button', { name: new RegExp(`^Jar ${n}:`) });
  await tile(5).click();
  await tile(5).click();
  await expect(tile(5)).toHaveAttribute('aria-label', 'Jar 5: not sealed');
  await ready.getByRole('button', { name: 'The other 6 sealed' }).click();
  await ready
    .getByRole('group', { name: 'Jar 5 did not seal: where does it go?' })
    .getByRole('button', { name: 'Fridge, eat within days' })
    .click();
  await expect(ready.getByText('A jar that did not seal')).toBeVisible();
  // The 64 px targets for wet hands: a tile and the save button.
  const tileBox = await tile(1).boundingBox();
  expect(tileBox?.height).toBeGreaterThanOrEqual(64);
  expect(tileBox?.width).toBeGreaterThanOrEqual(64);
  await ready.getByRole('button', { name: 'Save seal checks (7 of 7 jars)' }).click();

  // Six of seven sealed: the day's rate is 86 %, and the batch is now a lot in the pantry.
  await expect(day.getByTestId('seal-rate')).toHaveText('86% sealed · 6 of 7 jars checked');
  const lotLink = ready.getByRole('link', { name: /^In the pantry as lot \d{6}-A/ });
  await expect(lotLink).toBeVisible();
  await expect(tile(5)).toHaveAttribute('aria-label', 'Jar 5: not sealed');
  await snap(tablet, 'after-canner-tablet-3-seals-checked');
  expect(await accessibilityProblems(tablet)).toEqual([]);

  // The pantry lists the lot with its six sealed jars.
  await tablet.getByRole('link', { name: 'Pantry', exact: true }).click();
  await expect(tablet.getByRole('heading', { level: 1, name: 'Pantry' })).toBeVisible();
  const lots = tablet.getByRole('list', { name: 'Lots' });
  const lotCard = lots
    .getByRole('link')
    .filter({ hasText: 'Whole or halved tomatoes in water' })
    .filter({
      hasText: /6 jars on the shelf of 6 sealed/,
    });
  await expect(lotCard).toBeVisible();
  await snap(tablet, 'after-canner-tablet-4-pantry');
  expect(await accessibilityProblems(tablet)).toEqual([]);

  // Two jars given to the neighbours: the lot's book says so and four are left on the shelf.
  await lotCard.click();
  await expect(tablet.getByRole('heading', { level: 1, name: 'Whole or halved tomatoes in water' })).toBeVisible();
  await tablet.getByLabel('How many jars').fill('2');
  await tablet.getByLabel('Given to').fill('The Obi family at number 9');
  await tablet.getByRole('button', { name: 'Record the gift' }).click();
  await expect(tablet.getByRole('list', { name: 'Jars off the shelf' })).toContainText(
    '2 jars given away to The Obi family at number 9',
  );
  await expect(tablet.getByTestId('count-on-shelf')).toHaveText('On the shelf4');
  await expect(tablet.getByTestId('count-given')).toHaveText('Given away2');

  // The labels PDF for the chosen sheet.
  await tablet.getByRole('combobox', { name: 'Label sheet' }).click();
  await tablet.getByRole('option', { name: /A4 paper/ }).click();
  const [response, download] = await Promise.all([
    tablet.waitForResponse((r) => r.url().includes('/labels.pdf?sheet=a4-rect-63x38')),
    tablet.waitForEvent('download'),
    tablet.getByRole('button', { name: 'Download labels (PDF)' }).click(),
  ]);
  expect(response.status()).toBe(200);
  expect(response.headers()['content-type']).toContain('application/pdf');
  // The file the person gets is the PDF itself (the response's body is read by the page, so check the download).
  const pdf = await readFile(await download.path());
  expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  expect(download.suggestedFilename()).toMatch(/^jarday-labels-\d{6}-A-a4-rect-63x38\.pdf$/);
  await expect(tablet.getByRole('button', { name: 'Download labels (PDF)' })).toBeEnabled();
  await snap(tablet, 'after-canner-tablet-5-lot');
  expect(await accessibilityProblems(tablet)).toEqual([]);

  // A bulging lid: the spoilage report shows the botulism caution first, then flags the whole lot.
  await tablet.getByRole('button', { name: 'Spoiled' }).click();
  const caution = tablet.getByTestId('spoilage-caution');
  await expect(caution).toContainText('Spoilage reported: do not taste');
  await expect(caution).toContainText('Source: USDA Complete Guide to Home Canning');
  await tablet.getByLabel('How many jars').fill('1');
  await tablet.getByLabel('What did you see? (optional)').fill('The lid bulged on the shelf');
  await snap(tablet, 'after-canner-tablet-6-spoilage');
  await tablet.getByRole('button', { name: 'Report spoilage' }).click();
  await expect(tablet.getByText(/was reported spoiled: look carefully at every other jar/)).toBeVisible();
  await expect(tablet.getByTestId('count-on-shelf')).toHaveText('On the shelf3');
  expect(await accessibilityProblems(tablet)).toEqual([]);

  // The next morning on a phone: the helper sees the same shelf and the same lot.
  const phoneContext = await device(browser, PHONE, true);
  const phone = await phoneContext.newPage();
  await signIn(phone, HELPER);
  const phoneDay = await openShelf(phone);
  await expect(loadCard(phoneDay, 1).getByRole('button', { name: 'Jar 5: not sealed' })).toBeVisible();
  await expect(loadCard(phoneDay, 2).getByRole('button', { name: 'Bands off: load 2' })).toBeVisible();
  const bandsBox = await loadCard(phoneDay, 2).getByRole('button', { name: 'Bands off: load 2' }).boundingBox();
  expect(bandsBox?.height).toBeGreaterThanOrEqual(64);
  await snap(phone, 'after-canner-phone-1-shelf');
  expect(await accessibilityProblems(phone)).toEqual([]);
  await phone.getByRole('link', { name: 'Pantry', exact: true }).click();
  await expect(phone.getByRole('list', { name: 'Lots' })).toContainText('3 jars on the shelf of 6 sealed');
  await snap(phone, 'after-canner-phone-2-pantry');
  await phone
    .getByRole('list', { name: 'Lots' })
    .getByRole('link')
    .filter({ hasText: 'Whole or halved tomatoes in water' })
    .filter({ hasText: 'Spoilage reported: look at every jar' })
    .click();
  await expect(phone.getByRole('list', { name: 'Jars off the shelf' })).toContainText('The Obi family at number 9');
  await expect(phone.getByTestId('spoilage-caution').first()).toContainText('look carefully at every other jar');
  await snap(phone, 'after-canner-phone-3-lot');
  expect(await accessibilityProblems(phone)).toEqual([]);

  await tabletContext.close();
  await phoneContext.close();
});
