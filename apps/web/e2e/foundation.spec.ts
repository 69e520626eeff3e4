import { expect, test } from '@playwright/test';
import { device, PHONE, register, snap, TABLET, uniqueEmail } from './support.js';

test('a lead registers, starts a kitchen and invites a helper, who joins from a phone', async ({ browser }) => {
  const tablet = await device(browser, TABLET);
  const lead = await tablet.newPage();

  await lead.goto('/register');
  await register(lead, 'Odile Brand', uniqueEmail('odile'));
  await expect(lead).toHaveURL(/\/kitchens$/);
  await snap(lead, 'foundation-tablet-1-kitchens-empty');

  await lead.getByLabel('Kitchen name').fill('Orchard Row Kitchen');
  await lead.getByLabel('Altitude', { exact: true }).fill('640');
  await lead.getByRole('button', { name: 'Metres' }).click();
  await lead.getByRole('button', { name: 'Start kitchen' }).click();
  await expect(lead.getByRole('heading', { name: 'Orchard Row Kitchen' })).toBeVisible();
  await snap(lead, 'foundation-tablet-2-kitchen-home');

  await lead.getByRole('link', { name: /Members & invites/ }).click();
  await lead.getByRole('button', { name: 'Create invite' }).click();
  const code = (await lead.getByTestId('invite-code').innerText()).trim();
  expect(code).toMatch(/^[2-9A-HJKMNP-Z]{4}-[2-9A-HJKMNP-Z]{4}$/);
  const link = await lead.getByLabel('Invite link').inputValue();
  expect(link).toContain(`/join/${code.replace('-', '')}`);
  await snap(lead, 'foundation-tablet-3-invite');

  // The helper follows the link on a phone, has no account yet, registers, and lands back on the invite.
  const phoneContext = await device(browser, PHONE, true);
  const helper = await phoneContext.newPage();
  await helper.goto(new URL(link).pathname);
  await snap(helper, 'foundation-phone-1-join-signed-out');
  await helper
    .getByRole('link', { name: /create an account|register/i })
    .first()
    .click();
  await register(helper, 'Bram Oyelaran', uniqueEmail('bram'));
  await expect(helper.getByRole('button', { name: /Join Orchard Row Kitchen/ })).toBeVisible();
  await snap(helper, 'foundation-phone-2-join-preview');
  await helper.getByRole('button', { name: /Join Orchard Row Kitchen/ }).click();
  await expect(helper.getByRole('heading', { name: 'Orchard Row Kitchen' })).toBeVisible();
  await expect(helper.getByText(/You are helper here/)).toBeVisible();
  await snap(helper, 'foundation-phone-3-kitchen');

  // The lead sees the new member after a reload.
  await lead.reload();
  await expect(lead.getByText('Bram Oyelaran', { exact: true })).toBeVisible();
  await expect(lead.getByLabel('Role for Bram Oyelaran')).toContainText('Helper');
  await snap(lead, 'foundation-tablet-4-members');

  // The helper's kitchens list shows the kitchen with its altitude as entered.
  await helper.goto('/kitchens');
  await expect(helper.getByRole('link', { name: /Orchard Row Kitchen/ }).last()).toBeVisible();
  await expect(helper.getByText(/640 m/)).toBeVisible();
  await snap(helper, 'foundation-phone-4-kitchens');

  await tablet.close();
  await phoneContext.close();
});

test('the demo accounts sign in from the sign-in page', async ({ browser }) => {
  const tablet = await device(browser, TABLET);
  const page = await tablet.newPage();
  await page.goto('/sign-in');
  await page.getByRole('button', { name: /Maren Okafor/ }).click();
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByText('Quarry Hill Kitchen')).toBeVisible();
  await snap(page, 'foundation-tablet-demo-kitchens');
  await tablet.close();
});
