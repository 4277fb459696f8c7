import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, seriousAxeViolations, signIn, signOut, type Browser } from './support/browser';
import { freshEmail, linkIn, waitForMail } from './support/stack';

// Password reset end to end: requested in the browser, the e-mailed link followed, the new password
// works and the old one is refused. A fresh account is used so the demo accounts keep their password.
describe('password reset by e-mailed link', () => {
  let browser: Browser;
  const email = freshEmail('reset');
  const oldPassword = 'the first long password';
  const newPassword = 'a second, longer password';
  let resetLink = '';

  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('a new account is created and signed out', async () => {
    const { page } = browser;
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Pell Ashgrove');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(oldPassword);
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByRole('heading', { level: 1, name: 'Create your first crew' }).waitFor();
    await signOut(page);
  });

  it('sign-up shows the server’s field errors beside the fields', async () => {
    const { page } = browser;
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Someone Else');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('short');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByRole('heading', { name: 'Could not create the account' }).waitFor();
    await expect(page.getByLabel('Password').getAttribute('aria-invalid')).resolves.toBe('true');
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'sign-up-refused');
  });

  it('the reset is requested and the e-mail arrives with a link', async () => {
    const { page } = browser;
    await page.goto('/sign-in');
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByLabel('E-mail of your account').fill(email);
    await page.getByRole('button', { name: 'E-mail me a reset link' }).click();
    await page.getByRole('heading', { name: 'Check your inbox' }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'reset-requested');

    const mail = await waitForMail(email, /new Shoalbook password/);
    resetLink = linkIn(mail, '/reset-password');
    expect(new URL(resetLink).searchParams.get('token')).toBeTruthy();
  });

  it('following the link sets the new password', async () => {
    const { page } = browser;
    await page.goto(resetLink);
    await page.getByRole('heading', { level: 1, name: 'Choose a new password' }).waitFor();

    // Two different entries are caught before anything is sent.
    await page.locator('input[name="password"]').fill(newPassword);
    await page.locator('input[name="repeatPassword"]').fill(`${newPassword}!`);
    await page.getByRole('button', { name: 'Save new password' }).click();
    await page.getByText('The two passwords are not the same.').waitFor();

    await page.locator('input[name="repeatPassword"]').fill(newPassword);
    await page.getByRole('button', { name: 'Save new password' }).click();
    await page.getByRole('heading', { name: 'Your new password is set' }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'reset-done');
  });

  it('the old password is refused and the new one works', async () => {
    const { page } = browser;
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(oldPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('E-mail or password is wrong.').waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');

    await signIn(page, email, newPassword);
    await page.getByRole('heading', { level: 1, name: 'Create your first crew' }).waitFor();
    await signOut(page);
  });

  it('the reset link works only once', async () => {
    const { page } = browser;
    await page.goto(resetLink);
    await page.locator('input[name="password"]').fill('yet another long password');
    await page.locator('input[name="repeatPassword"]').fill('yet another long password');
    await page.getByRole('button', { name: 'Save new password' }).click();
    await page.getByRole('heading', { name: 'This reset link no longer works' }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
  });
});
