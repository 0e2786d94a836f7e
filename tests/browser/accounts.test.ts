/**
 * Accounts in Chromium at phone size: a new user signs up, an admin finds the verification mail in
 * the development Outbox, the new user follows its link, signs in and sees the sections of the
 * contributor role; the admin promotes them to editor and the Desk appears for them.
 * Screenshots go to test-output/screenshots/.
 */
import path from 'node:path';
import type { Page } from 'playwright-core';
import { byTestId, screenshotDir, signInThroughForm, startHarness, type Harness } from '../support/browser';

jest.setTimeout(180_000);

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

// Invented test data: an example.org address and a password of our own.
const newUser = { email: 'new.referee@example.org', name: 'Farah Quintero', password: 'slow-orbit-lantern-42' };
// The demo admin seeded in development (README, "Roles and demo accounts").
const admin = { email: 'admin@example.org', password: 'counterweight-demo-2026' };


const navLabels = (page: Page) =>
  byTestId(page, 'nav-bar').locator('a').evaluateAll((links) => links.map((a) => a.textContent?.trim()));

it('signs up, verifies through the Outbox, signs in, and is promoted by an admin', async () => {
  const user = await h.open(390, 844);
  await user.goto(`${h.base}/sign-up`);
  await byTestId(user, 'screen-sign-up').waitFor();
  // The shared schema refuses a short password before anything is sent.
  await byTestId(user, 'field-email').fill(newUser.email);
  await byTestId(user, 'field-displayName').fill(newUser.name);
  await byTestId(user, 'field-password').fill('short');
  await byTestId(user, 'submit').click();
  await byTestId(user, 'error-password').waitFor();
  await byTestId(user, 'field-password').fill(newUser.password);
  await byTestId(user, 'submit').click();
  await user.getByText(/check your e-mail/i).first().waitFor();
  await user.screenshot({ path: path.join(screenshotDir, 'accounts-signed-up.png') });

  const adminPage = await h.open(390, 844);
  await signInThroughForm(adminPage, h.base, admin.email, admin.password);
  expect(await navLabels(adminPage)).toEqual(expect.arrayContaining(['Desk', 'Queue', 'Admin']));
  await adminPage.goto(`${h.base}/admin/outbox`);
  await byTestId(adminPage, 'screen-outbox').waitFor();
  const mail = byTestId(adminPage, 'outbox-message').filter({ hasText: newUser.email }).first();
  await mail.waitFor();
  const link = await mail.locator('a[href*="/verify?token="]').first().getAttribute('href');
  expect(link).toBeTruthy();
  await adminPage.screenshot({ path: path.join(screenshotDir, 'accounts-outbox.png') });

  await user.goto(new URL(link!, h.base).toString());
  await byTestId(user, 'screen-verify').waitFor();
  await user.getByText(/verified/i).first().waitFor();
  await signInThroughForm(user, h.base, newUser.email, newUser.password);
  expect(await byTestId(user, 'account-role').textContent()).toMatch(/contributor/i);
  const readerSections = await navLabels(user);
  expect(readerSections).not.toContain('Desk');
  expect(readerSections).not.toContain('Admin');
  await user.screenshot({ path: path.join(screenshotDir, 'accounts-signed-in.png') });

  await adminPage.goto(`${h.base}/admin`);
  await byTestId(adminPage, 'screen-admin').waitFor();
  const row = byTestId(adminPage, `user-row-${newUser.email}`);
  await row.waitFor();
  await byTestId(adminPage, `role-${newUser.email}-editor`).click();
  await byTestId(adminPage, 'confirm-dialog-accept').click();
  await byTestId(adminPage, `role-status-${newUser.email}`).waitFor();

  await user.reload();
  await byTestId(user, 'nav-desk').waitFor();
  expect(user.problems).toEqual([]);
  expect(adminPage.problems).toEqual([]);
  await user.context().close();
  await adminPage.context().close();
});
