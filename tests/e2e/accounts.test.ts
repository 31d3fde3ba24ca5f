import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { closeDatabase } from '@/db/client';
import { DEMO_LOGINS } from '@/db/seed/demo-logins.mjs';
import { ROLE_LABELS, ROLE_NAVIGATION, type Role } from '@/lib/roles';
import { createAccount, uniqueEmail } from '../support/accounts';
import { openBrowser, screenshot, signIn } from '../support/browser';
import { linkFrom, waitForMail } from '../support/mail-sink';

const PHONE = { width: 390, height: 844 };
const NEW_PASSWORD = 'three lathes in a row';
const coordinator = DEMO_LOGINS.accounts.find((account) => account.role === 'admin')!;

async function navigationLabels(page: Page) {
  return page.getByRole('navigation', { name: 'Main' }).getByRole('link').allTextContents();
}

async function expectSignedInAs(page: Page, role: Role) {
  await page.getByRole('banner').getByText(ROLE_LABELS[role], { exact: false }).waitFor();
  expect(await navigationLabels(page)).toEqual(ROLE_NAVIGATION[role].map((item) => item.label));
}

describe('accounts in the browser', () => {
  let browser: BrowserContext;
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await closeDatabase();
  });

  for (const role of ['seller', 'buyer', 'dealer'] as const) {
    it(`signs up a ${role}, confirms the address from the mail and signs in`, async () => {
      const context = role === 'seller' ? await openBrowser(PHONE) : browser;
      const page = await context.newPage();
      const email = uniqueEmail(`e2e-${role}`);
      await page.goto('/sign-in');
      await page.getByRole('link', { name: 'New here? Create an account' }).click();
      await page.waitForURL('**/sign-up');
      await page.getByRole('radio', { name: new RegExp(role === 'seller' ? 'I sell machines' : role === 'buyer' ? 'I buy a machine' : 'I trade machines') }).check();
      await page.getByLabel('Your name').fill('Ines Harrow');
      await page.getByLabel('Business name').fill('Harrow Spindle Works');
      await page.getByLabel('Town').fill('Lowmere');
      await page.getByLabel('Region').fill('Brenmark');
      await page.getByLabel('E-mail').fill(email);
      await page.getByLabel('Password', { exact: true }).fill('short');
      await page.getByLabel('Password again').fill('short');
      await page.getByRole('button', { name: 'Create account' }).click();
      await page.getByText('Use at least 12 characters').waitFor();
      if (role === 'seller') await screenshot(page, 'sign-up-errors-phone');
      await page.getByLabel('Password', { exact: true }).fill(NEW_PASSWORD);
      await page.getByLabel('Password again').fill(NEW_PASSWORD);
      await page.getByRole('button', { name: 'Create account' }).click();
      await page.getByText('Check your inbox').waitFor();
      if (role === 'seller') await screenshot(page, 'sign-up-sent-phone');

      // Not confirmed yet: the right password is answered with a pointer to the mail.
      await page.goto('/sign-in');
      await page.getByLabel('E-mail').fill(email);
      await page.getByLabel('Password').fill(NEW_PASSWORD);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByText('Please confirm your e-mail address first').waitFor();

      const mail = await waitForMail(email, 'Confirm your e-mail address');
      expect(mail.html).toContain('Confirm my address');
      await page.goto(linkFrom(mail, '/confirm-email'));
      if (role === 'seller') await screenshot(page, 'confirm-email-phone');
      await page.getByRole('button', { name: 'Confirm my address' }).click();
      await page.waitForURL('**/sign-in?notice=email-confirmed');
      await page.getByText('Your address is confirmed').waitFor();
      await page.getByLabel('E-mail').fill(email);
      await page.getByLabel('Password').fill(NEW_PASSWORD);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL('**/dashboard');
      await expectSignedInAs(page, role);
      await page.close();
      if (context !== browser) await context.close();
    });
  }

  it('lets a coordinator invite an inspector, who sets a password from the mail and signs in', async () => {
    const page = await browser.newPage();
    await signIn(page, coordinator.email, DEMO_LOGINS.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'People' }).click();
    await page.waitForURL('**/admin/people');
    await page.getByRole('table').waitFor();
    await screenshot(page, 'people-list');
    await page.getByRole('link', { name: 'Invite an inspector or coordinator' }).click();
    const email = uniqueEmail('e2e-inspector');
    await page.getByLabel('Name').fill('Oskar Tenwick');
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('radio', { name: /Inspector/ }).check();
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to ${email}`).waitFor();
    await screenshot(page, 'invite-sent');

    // Inviting the same address again is refused next to the field, and nothing is lost.
    await page.getByLabel('Name').fill('Oskar Tenwick');
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText('This address already has an account').waitFor();

    const mail = await waitForMail(email, 'invited you to Waygrade');
    const invitee = await openBrowser(PHONE);
    const invitePage = await invitee.newPage();
    await invitePage.goto(linkFrom(mail, '/invitation'));
    await invitePage.getByText('You are joining as inspector').waitFor();
    await screenshot(invitePage, 'invitation-phone');
    await invitePage.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD);
    await invitePage.getByLabel('New password again').fill(NEW_PASSWORD);
    await invitePage.getByRole('button', { name: 'Save password and continue' }).click();
    await invitePage.waitForURL('**/sign-in?notice=password-set');
    await signIn(invitePage, email, NEW_PASSWORD);
    await expectSignedInAs(invitePage, 'inspector');

    // The link works once.
    await invitePage.goto(linkFrom(mail, '/invitation'));
    await invitePage.getByText('This invitation has expired or was already used').waitFor();
    await invitee.close();
    await page.close();
  });

  it('refuses a deactivated person and ends the session they had open', async () => {
    const person = await createAccount('buyer', { name: 'Linnea Quarry' });
    const theirs = await openBrowser();
    const theirPage = await theirs.newPage();
    await signIn(theirPage, person.email, person.password);

    const page = await browser.newPage();
    await signIn(page, coordinator.email, DEMO_LOGINS.password);
    await page.goto(`/admin/people?q=${encodeURIComponent(person.email)}`);
    await page.getByRole('link', { name: /Linnea Quarry/ }).click();
    await page.getByRole('button', { name: 'Deactivate account' }).click();
    await page.getByRole('button', { name: 'Yes, deactivate Linnea Quarry' }).click();
    await page.getByText('Linnea Quarry cannot sign in').waitFor();
    await screenshot(page, 'person-deactivated');

    // Their cookie is still there, but the session behind it has ended: the page sends them to sign-in.
    await theirPage.goto('/dashboard');
    await theirPage.waitForURL('**/sign-in**');
    await theirPage.getByLabel('E-mail').fill(person.email);
    await theirPage.getByLabel('Password').fill(person.password);
    await theirPage.getByRole('button', { name: 'Sign in' }).click();
    await theirPage.getByText('That e-mail and password do not match an active account.').waitFor();

    await page.goto(`/admin/audit?entity=user&entityId=${person.id}`);
    await page.getByRole('cell', { name: 'user.deactivate' }).waitFor();
    await screenshot(page, 'audit-log-filtered');
    await theirs.close();
    await page.close();
  });

  it('resets a forgotten password from the mail and ends the older session', async () => {
    const person = await createAccount('dealer');
    const older = await openBrowser();
    const olderPage = await older.newPage();
    await signIn(olderPage, person.email, person.password);

    const context = await openBrowser(PHONE);
    const page = await context.newPage();
    await page.goto('/sign-in');
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.waitForURL('**/forgot-password');
    await page.getByLabel('E-mail').fill(person.email);
    await page.getByRole('button', { name: 'Mail me a link' }).click();
    await page.getByText('a link to choose a new password is on its way').waitFor();
    const mail = await waitForMail(person.email, 'Choose a new Waygrade password');
    await page.goto(linkFrom(mail, '/reset-password'));
    await page.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD);
    await page.getByLabel('New password again').fill('three lathes in a rov');
    await page.getByRole('button', { name: 'Save new password' }).click();
    await page.getByText('The two passwords differ').waitFor();
    await screenshot(page, 'reset-password-phone');
    await page.getByLabel('New password again').fill(NEW_PASSWORD);
    await page.getByRole('button', { name: 'Save new password' }).click();
    await page.waitForURL('**/sign-in?notice=password-set');
    await signIn(page, person.email, NEW_PASSWORD);
    await expectSignedInAs(page, 'dealer');

    await olderPage.goto('/dashboard');
    await olderPage.waitForURL('**/sign-in**');
    await older.close();
    await context.close();
  });

  for (const role of ['seller', 'inspector', 'buyer', 'dealer'] as const) {
    it(`shows a ${role} only their navigation and no coordinator pages`, async () => {
      const account = DEMO_LOGINS.accounts.find((a) => a.role === role)!;
      const context = await openBrowser();
      const page = await context.newPage();
      await signIn(page, account.email, DEMO_LOGINS.password);
      await expectSignedInAs(page, role);
      // The page answers "not found" inside the already-streaming layout, so the status is not 404: judge what is shown.
      for (const path of ['/admin/people', '/admin/audit', '/admin/people/invite']) {
        await page.goto(path);
        await page.getByText('This page is off the bed.').waitFor();
        expect(await page.getByRole('table').count(), path).toBe(0);
      }
      await context.close();
    });
  }

  it('shows the coordinator the admin navigation and the people list on a phone', async () => {
    const context = await openBrowser(PHONE);
    const page = await context.newPage();
    await signIn(page, coordinator.email, DEMO_LOGINS.password);
    await expectSignedInAs(page, 'admin');
    await page.goto('/admin/people?role=inspector');
    await page.getByRole('table').waitFor();
    expect(await page.getByRole('row').count()).toBeGreaterThan(3);
    await screenshot(page, 'people-inspectors-phone');
    await page.goto('/admin/audit');
    await page.getByRole('table').waitFor();
    await screenshot(page, 'audit-log-phone');
    await page.goto('/admin/people?q=nobody-by-this-name');
    await page.getByText('Nobody matches these filters').waitFor();
    await context.close();
  });
});
