import AxeBuilder from '@axe-core/playwright';
import { expect, test, type APIRequestContext, type Locator, type Page } from '@playwright/test';
import { device, PHONE, snap, TABLET } from './support.js';

/** Serious and critical accessibility findings (axe-core, WCAG 2 A and AA rules). */
async function accessibilityProblems(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21aa']).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

/** The demo scenario's invented people (seeds/demo-kitchen.json). */
const LEAD = { name: 'Maren Okafor', email: 'maren@quarryhill.test', password: 'demo-lead-pass' };
const HELPER = { name: 'Teo Vance' };

/** The kitchen needs the hot-packed jam recipe: the demo seed has it; a copy of the starter is made if not. */
async function ensureJamRecipe(request: APIRequestContext) {
  const session = (await (
    await request.post('/api/auth/sign-in', { data: { email: LEAD.email, password: LEAD.password } })
  ).json()) as { accessToken: string };
  const headers = { Authorization: `Bearer ${session.accessToken}` };
  const kitchens = (await (await request.get('/api/kitchens', { headers })).json()) as { id: string; name: string }[];
  const kitchen = kitchens.find((k) => k.name === 'Quarry Hill Kitchen');
  if (!kitchen) throw new Error('the demo kitchen is missing');
  const recipes = (await (await request.get(`/api/kitchens/${kitchen.id}/recipes`, { headers })).json()) as {
    name: string;
  }[];
  if (recipes.some((r) => r.name === 'Hot-packed jam')) return;
  const copied = await request.post(`/api/kitchens/${kitchen.id}/recipes/copy`, {
    headers,
    data: { recipeId: 'starter-hot-packed-jam' },
  });
  expect(copied.status()).toBe(201);
}

async function signIn(page: Page, name: string) {
  await page.goto('/sign-in');
  await page.getByRole('button', { name: new RegExp(`Use demo account ${name}`) }).click();
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('link', { name: /Quarry Hill Kitchen/ }).first()).toBeVisible();
}

async function choose(page: Page, field: string, option: RegExp) {
  await page.getByRole('combobox', { name: field }).click();
  await page.getByRole('option', { name: option }).click();
}

/**
 * Browsers keep sound off until a person taps the page; headless chromium lets it start at once. Either way the
 * device must end up saying "Sound on": tap the offer when it is there.
 */
async function turnSoundOn(screen: Locator) {
  const offer = screen.getByRole('button', { name: 'Tap to turn sound on' });
  const on = screen.getByRole('status', { name: 'Sound on' });
  await expect(on.or(offer)).toBeVisible();
  if (await offer.isVisible()) await offer.click();
  await expect(on).toBeVisible();
}

/** "9:58" -> 598 seconds. */
const seconds = (text: string) => text.split(':').reduce((total, part) => total * 60 + Number(part), 0);
const digits = (scope: Locator) => scope.getByRole('timer').first();

test('a canning day on the Counter board and a phone: boil, boil lost, offline catch-up, an alarm acknowledged on the phone', async ({
  browser,
  request,
}) => {
  test.setTimeout(180_000);
  await ensureJamRecipe(request);

  // The lead starts the day on the tablet: a batch of jam, a refused load, then a load in the water-bath canner.
  const tabletContext = await device(browser, TABLET);
  const tablet = await tabletContext.newPage();
  await signIn(tablet, LEAD.name);
  await tablet
    .getByRole('link', { name: /Quarry Hill Kitchen/ })
    .first()
    .click();
  await tablet.getByRole('link', { name: /Canning days/ }).click();
  await tablet.getByRole('link', { name: 'Start a canning day' }).click();
  await tablet.getByLabel('Name of the day').fill('Apricot jam');
  await tablet.getByRole('button', { name: 'Start the day' }).click();
  await expect(tablet.getByRole('heading', { level: 1, name: 'Apricot jam' })).toBeVisible();

  await choose(tablet, 'Recipe', /Hot-packed jam/);
  await expect(tablet.getByRole('combobox', { name: 'Jars and pack' })).toContainText('half-pint jars, hot pack');
  await tablet.getByLabel('Number of jars').fill('12');
  await tablet.getByRole('button', { name: 'Add batch' }).click();
  await expect(tablet.getByText('12 half-pint jars, hot pack')).toBeVisible();

  await choose(tablet, 'Canner', /Tall pressure canner/);
  await tablet.getByLabel('Jars in this load').fill('6');
  await tablet.getByRole('button', { name: 'Make load' }).click();
  // The server's refusal, as the rules word it: jam has no tested pressure process.
  await expect(tablet.getByTestId('load-refusal')).toContainText('boiling-water');
  await snap(tablet, 'board-tablet-1-load-refused');

  await choose(tablet, 'Canner', /Speckled water-bath canner/);
  await tablet.getByLabel('Jars in this load').fill('6');
  await tablet.getByRole('button', { name: 'Make load' }).click();
  // Hot-packed jam at 2,350 ft: 10 minutes (USDA Guide 7, secondary copy).
  await expect(tablet.getByText(/Load 1 · Speckled water-bath canner/)).toBeVisible();
  await expect(tablet.getByText(/Hot-packed jam: 10 min at 2,350 ft/)).toBeVisible();
  await tablet.getByRole('link', { name: 'Open the Counter board' }).click();

  const board = tablet.getByTestId('counter-board');
  const canner = board.getByRole('region', { name: 'Speckled water-bath canner' });
  await expect(canner.getByTestId('load-timer')).toHaveAttribute('data-phase', 'filling');
  await expect(board.getByTestId('connection')).toHaveAttribute('data-connection', 'live');
  await turnSoundOn(board);

  // The helper follows the same day on a phone.
  const phoneContext = await device(browser, PHONE, true);
  const phone = await phoneContext.newPage();
  await signIn(phone, HELPER.name);
  await phone.goto(new URL(tablet.url()).pathname.replace(/\/board$/, '/pocket'));
  const pocket = phone.getByTestId('pocket-view');
  const pocketLoad = pocket.getByTestId('pocket-load');
  await expect(pocketLoad).toHaveAttribute('data-phase', 'filling');
  await turnSoundOn(pocket);

  // A step ticked on the tablet moves the phone's guide on too (step:confirm, in the journal).
  await expect(pocketLoad.getByTestId('current-step')).toHaveText('Fill the hot jars');
  await canner.getByRole('button', { name: 'Next step: Load 1' }).click();
  await expect(canner.getByTestId('current-step')).toHaveText('Leave 1/4 in (6 mm) headspace');
  await expect(pocketLoad.getByTestId('current-step')).toHaveText('Leave 1/4 in (6 mm) headspace');
  await expect(pocketLoad.getByTestId('headspace-picture')).toBeVisible();
  expect(await accessibilityProblems(tablet)).toEqual([]);
  expect(await accessibilityProblems(phone)).toEqual([]);

  // Water heating, then the rolling boil on the tablet: the phone shows the process running.
  await canner.getByRole('button', { name: 'Water heating, lid on: load 1' }).click();
  await expect(pocketLoad).toHaveAttribute('data-phase', 'heating');
  await canner.getByRole('button', { name: 'Rolling boil: load 1' }).click();
  await expect(canner.getByTestId('load-timer')).toHaveAttribute('data-phase', 'processing');
  await expect(pocketLoad).toHaveAttribute('data-phase', 'processing');
  await expect(pocketLoad.getByText('Processing', { exact: true })).toBeVisible();

  // Both count down from the same server deadline: read together, they agree to within a second.
  const [onTablet, onPhone] = await Promise.all([digits(canner).innerText(), digits(pocketLoad).innerText()]);
  expect(seconds(onTablet)).toBeLessThanOrEqual(600);
  expect(Math.abs(seconds(onTablet) - seconds(onPhone))).toBeLessThanOrEqual(1);

  // Readable from across the kitchen: the tablet's digits are at least 96 px.
  const size = await digits(canner).evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
  expect(size).toBeGreaterThanOrEqual(96);
  await snap(tablet, 'board-tablet-2-processing');
  await snap(phone, 'board-phone-1-processing');

  // Boil lost: both go back to waiting with the full 10 minutes.
  await canner.getByRole('button', { name: 'Boil lost: load 1' }).click();
  await expect(canner.getByTestId('load-timer')).toHaveAttribute('data-phase', 'heating');
  await expect(digits(canner)).toHaveText('10:00');
  await expect(pocketLoad).toHaveAttribute('data-phase', 'heating');
  await expect(digits(pocketLoad)).toHaveText('10:00');

  // The phone loses its network; the tablet confirms the boil again meanwhile; the phone catches up on return.
  await phoneContext.setOffline(true);
  await expect(pocket.getByTestId('connection-banner')).toHaveAttribute('data-connection', 'offline');
  await canner.getByRole('button', { name: 'Rolling boil: load 1' }).click();
  await expect(canner.getByTestId('load-timer')).toHaveAttribute('data-phase', 'processing');
  await expect(pocketLoad).toHaveAttribute('data-phase', 'heating');
  await snap(phone, 'board-phone-2-offline');
  await phoneContext.setOffline(false);
  await expect(pocketLoad).toHaveAttribute('data-phase', 'processing');
  await expect(pocket.getByTestId('connection-banner')).toHaveCount(0);

  // A 30-second blanch dip from the tablet's prep station rings on both; the phone acknowledges it for everyone.
  await board.getByRole('region', { name: 'Prep' }).getByRole('button', { name: 'Blanch dip 30 s' }).click();
  await expect(pocket.getByTestId('pocket-timer').filter({ hasText: 'Blanch dip' })).toBeVisible();
  const tabletAlarm = tablet.getByTestId('alarm-overlay');
  const phoneAlarm = phone.getByTestId('alarm-overlay');
  await expect(tabletAlarm).toBeVisible({ timeout: 45_000 });
  await expect(phoneAlarm).toBeVisible();
  await expect(tabletAlarm).toContainText('Out of the boiling water and into cold water.');
  await expect(tabletAlarm).toHaveAttribute('data-sound', 'playing');
  await expect(board).toHaveAttribute('data-alarm-sound', 'playing');
  await snap(tablet, 'board-tablet-3-alarm');
  await snap(phone, 'board-phone-3-alarm');
  await phoneAlarm.getByRole('button', { name: 'Acknowledge: Blanch dip' }).click();
  await expect(phoneAlarm).toBeHidden();
  await expect(tabletAlarm).toBeHidden();
  await expect(board).toHaveAttribute('data-alarm-sound', 'stopped');

  // A lead can show a one-day helper invite for a phone that is not in the kitchen yet.
  await board.getByRole('button', { name: 'Phones' }).click();
  await expect(board.getByRole('img', { name: 'QR code of the Pocket view link' })).toBeVisible();
  await board.getByRole('button', { name: 'Make a helper invite' }).click();
  await expect(board.getByRole('img', { name: 'QR code of the helper invite' })).toBeVisible();
  await expect(board.getByTestId('phone-invite-code')).toHaveText(/^[2-9A-HJKMNP-Z]{4}-[2-9A-HJKMNP-Z]{4}$/);
  await expect(board.getByLabel('Invite link')).toHaveValue(/\/join\/[2-9A-HJKMNP-Z]{8}\?next=/);
  await snap(tablet, 'board-tablet-4-phones');

  await tabletContext.close();
  await phoneContext.close();
});
