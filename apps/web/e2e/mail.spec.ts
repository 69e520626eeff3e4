import { expect, type Page, test } from '@playwright/test';
import { device, PHONE, register, snap, TABLET, uniqueEmail } from './support.js';

/** The demo scenario's invented lead (seeds/demo-kitchen.json). */
const LEAD = { name: 'Maren Okafor' };

interface CaughtMail {
  to: string[];
  subject: string;
  text: string;
  links: string[];
  at: string;
}

async function signIn(page: Page, name: string) {
  await page.goto('/sign-in');
  await page.getByRole('button', { name: new RegExp(`Use demo account ${name}`) }).click();
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect(page.getByRole('link', { name: /Quarry Hill Kitchen/ }).first()).toBeVisible();
}

test('a lead e-mails an invite; the link in the caught mail joins the kitchen in Chromium', async ({
  browser,
  request,
}) => {
  const tablet = await device(browser, TABLET);
  const lead = await tablet.newPage();
  await signIn(lead, LEAD.name);
  await lead
    .getByRole('link', { name: /Quarry Hill Kitchen/ })
    .first()
    .click();
  await lead.getByRole('link', { name: /Members & invites/ }).click();

  const email = uniqueEmail('jonas');
  await lead.getByLabel('E-mail the link to (optional)').fill(email);
  await lead.getByRole('button', { name: 'Create invite' }).click();
  await expect(lead.getByTestId('invite-emailed')).toContainText(`on its way to ${email}`);
  const code = (await lead.getByTestId('invite-code').innerText()).trim();
  await snap(lead, 'mail-tablet-1-invite-emailed');

  // Demo mode runs the loopback catcher; its route lists what it caught.
  let mail: CaughtMail | undefined;
  await expect
    .poll(async () => {
      const caught = (await (await request.get('/api/dev/mail')).json()) as CaughtMail[];
      mail = caught.find((m) => m.to.includes(email));
      return mail?.subject;
    })
    .toBe('Join Quarry Hill Kitchen on Jarday');
  expect(mail!.text).toContain(`Maren Okafor invites you to Quarry Hill Kitchen`);
  const link = mail!.links.find((l) => l.includes('/join/'))!;
  expect(new URL(link).pathname).toBe(`/join/${code.replace('-', '')}`);

  // The invited person opens the link on a phone, has no account yet, registers and joins.
  const phoneContext = await device(browser, PHONE, true);
  const phone = await phoneContext.newPage();
  await phone.goto(link);
  await phone
    .getByRole('link', { name: /create an account|register/i })
    .first()
    .click();
  await register(phone, 'Jonas Feld', email);
  await phone.getByRole('button', { name: /Join Quarry Hill Kitchen/ }).click();
  await expect(phone.getByRole('heading', { name: 'Quarry Hill Kitchen' })).toBeVisible();
  await expect(phone.getByText(/You are helper here/)).toBeVisible();

  // The new helper turns their own reminders off on the members page; the choice survives a reload.
  await phone
    .getByRole('link', { name: /Members/ })
    .first()
    .click();
  const reminders = phone.getByRole('switch', { name: 'E-mail me reminders' });
  await expect(reminders).toBeChecked();
  await reminders.click();
  await expect(reminders).not.toBeChecked();
  await phone.reload();
  await expect(phone.getByRole('switch', { name: 'E-mail me reminders' })).not.toBeChecked();
  await snap(phone, 'mail-phone-1-members-reminders-off');

  // The dev outbox page shows the same caught mail, with its link.
  await lead.goto('/dev/mail');
  await expect(lead.getByRole('heading', { name: 'Join Quarry Hill Kitchen on Jarday' }).first()).toBeVisible();
  await expect(lead.getByRole('link', { name: link }).first()).toBeVisible();
  await snap(lead, 'mail-tablet-2-dev-outbox');

  await phoneContext.close();
  await tablet.close();
});
