import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, seriousAxeViolations, signIn, signOut, type Browser } from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD, RIVAL_CREW } from './support/stack';

// What each demo account sees in the real app, with an accessibility check on every screen visited.
describe('demo accounts and their roles', () => {
  let browser: Browser;
  let demoCrewPath = '';

  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('sends a signed-out visitor to sign-in, and the signed-out screens pass axe', async () => {
    const { page } = browser;
    await page.goto('/crews/some-crew/settings');
    await page.waitForURL(/\/sign-in\?next=/);
    await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
    await page.getByRole('heading', { name: 'On the water' }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'sign-in');

    await page.goto('/sign-up');
    await page.getByRole('heading', { level: 1, name: 'Create an account' }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'sign-up');

    await page.goto('/reset-password');
    await page.getByRole('heading', { level: 1, name: 'Reset your password' }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);

    await page.goto('/no-such-page');
    await page.getByRole('heading', { level: 1, name: 'Nothing at this address' }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
  });

  it('refuses a wrong password with the server’s sentence', async () => {
    const { page } = browser;
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill('owner@demo.test');
    await page.getByLabel('Password').fill('not-the-demo-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('E-mail or password is wrong.').waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'sign-in-refused');
  });

  it('owner: lands in the demo crew and has every management control', async () => {
    const { page } = browser;
    await signIn(page, 'owner@demo.test', DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    demoCrewPath = new URL(page.url()).pathname;
    expect(demoCrewPath).toMatch(/^\/crews\/[^/]+$/);
    await page.getByRole('heading', { name: 'Welcome to the journal' }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'owner-crew-home');

    await page.getByRole('link', { name: 'Crew & members' }).click();
    await page.getByRole('heading', { name: 'Members' }).waitFor();
    await page.getByRole('cell', { name: 'viewer@demo.test', exact: true }).waitFor();
    // Other test files may add members; the three seeded ones are checked by name.
    for (const name of ['Wren Halvorsen', 'Milo Farrant', 'Ines Barlow (coach)']) {
      await page.getByRole('combobox', { name: `Role of ${name}` }).waitFor();
    }
    await expect(page.getByRole('combobox', { name: 'Role of Ines Barlow (coach)' }).inputValue()).resolves.toBe(
      'viewer',
    );
    await page.getByRole('button', { name: 'Remove Milo Farrant from the crew' }).waitFor();
    await page.getByRole('button', { name: 'Remove Ines Barlow (coach) from the crew' }).waitFor();
    expect(await page.getByRole('button', { name: /^Remove Wren Halvorsen/ }).count()).toBe(0);
    await page.getByRole('button', { name: 'Send invite' }).waitFor();
    const positions = page.getByRole('button', { name: /Viewers see exact positions/ });
    await positions.waitFor();
    await expect(positions.getAttribute('aria-pressed')).resolves.toBe('false');
    await positions.click();
    await expect.poll(() => positions.getAttribute('aria-pressed')).toBe('true');
    await page.reload();
    await expect.poll(() => positions.getAttribute('aria-pressed'), { timeout: 15_000 }).toBe('true');
    await positions.click();
    await expect.poll(() => positions.getAttribute('aria-pressed')).toBe('false');
    await page.getByRole('heading', { name: 'Pending invites' }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'owner-crew-settings');

    // The remove dialog asks first, and cancelling keeps the member.
    await page.getByRole('button', { name: /^Remove Milo Farrant/ }).click();
    const dialog = page.getByRole('alertdialog').or(page.getByRole('dialog'));
    await dialog.getByText(/will lose access/).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'owner-remove-dialog');
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await page.getByRole('cell', { name: 'angler@demo.test', exact: true }).waitFor();

    // The owner's crew switcher lists the demo crew only.
    await page.getByRole('button', { name: /: switch crew$/ }).click();
    const menu = page.getByRole('menu');
    await menu.waitFor();
    await menu.getByText(DEMO_CREW).waitFor();
    expect(await menu.getByText(RIVAL_CREW).count()).toBe(0);
    await page.keyboard.press('Escape');

    // Not an admin: no accounts link, and the admin page says so.
    expect(await page.getByRole('link', { name: 'Accounts' }).count()).toBe(0);
    await page.goto('/admin');
    await page.getByText('For site administrators only').waitFor();

    await page.goto('/account');
    await page.getByRole('heading', { level: 1, name: 'Your account' }).waitFor();
    await expect(page.getByRole('radio', { name: /Pounds, decimal/ }).isChecked()).resolves.toBe(true);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'account');
    await signOut(page);
  });

  it('changing units on the account page is kept across a reload', async () => {
    const { page } = browser;
    await signIn(page, 'angler@demo.test', DEMO_PASSWORD);
    await page.goto('/account');
    await page.getByRole('radio', { name: /Kilograms/ }).check();
    await page.getByRole('radio', { name: /Metres \(/ }).check();
    await page.getByRole('button', { name: 'Save units' }).click();
    await page.getByText('Units saved.').waitFor();
    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Your account' }).waitFor();
    await expect(page.getByRole('radio', { name: /Kilograms/ }).isChecked()).resolves.toBe(true);
    await expect(page.getByRole('radio', { name: /Metres \(/ }).isChecked()).resolves.toBe(true);
    await expect(page.getByRole('radio', { name: /Inches/ }).isChecked()).resolves.toBe(true);
    await signOut(page);
  });

  it('dark screens chosen on the account page are kept on this device, and pass axe (contrast included)', async () => {
    const { page } = browser;
    await signIn(page, 'angler@demo.test', DEMO_PASSWORD);
    await page.goto('/account');
    await page.getByRole('radio', { name: /^Dark/ }).check();
    const background = () => page.evaluate(() => getComputedStyle(document.querySelector('.sb-root')!).backgroundColor);
    const mode = () =>
      page.evaluate(() => document.querySelector('[data-color-mode]')!.getAttribute('data-color-mode'));
    await expect(mode()).resolves.toBe('dark');
    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Your account' }).waitFor();
    await expect(page.getByRole('radio', { name: /^Dark/ }).isChecked()).resolves.toBe(true);
    // Primer's dark ground (#0d1117) rather than white.
    await expect(background()).resolves.toBe('rgb(13, 17, 23)');
    expect(await seriousAxeViolations(page)).toEqual([]);
    await page.goto(`${demoCrewPath}/events`);
    await page.getByRole('table').first().waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'dark-events');
    await page.goto(`${demoCrewPath}/reports`);
    await page.getByRole('navigation', { name: 'Reports' }).getByRole('link', { name: 'Hit rates' }).click();
    await page.locator('.sb-whisker').first().waitFor();
    await screenshot(page, 'dark-reports');
    await page.goto('/account');
    await page.getByRole('radio', { name: /^As this device is set/ }).check();
    await expect(mode()).resolves.toBe('auto');
    await signOut(page);
  });

  for (const who of [
    { email: 'angler@demo.test', role: 'Angler' },
    { email: 'viewer@demo.test', role: 'Viewer' },
  ]) {
    it(`${who.role.toLowerCase()}: sees the members but no management controls`, async () => {
      const { page } = browser;
      await signIn(page, who.email, DEMO_PASSWORD);
      await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
      await page.getByText(`You: ${who.role}`).waitFor();
      if (who.role === 'Viewer') await page.getByText(/As a viewer you can read everything/).waitFor();

      await page.goto(`${new URL(page.url()).pathname}/settings`);
      await page.getByRole('cell', { name: 'owner@demo.test', exact: true }).waitFor();
      expect(await page.getByRole('combobox').count()).toBe(0);
      expect(await page.getByRole('button', { name: /^Remove / }).count()).toBe(0);
      expect(await page.getByRole('button', { name: 'Send invite' }).count()).toBe(0);
      // Primer's toggle switch is a button with aria-pressed.
      expect(await page.getByRole('button', { name: /Viewers see exact positions/ }).count()).toBe(0);
      expect(await page.getByRole('heading', { name: 'Pending invites' }).count()).toBe(0);
      expect(await page.getByRole('button', { name: 'Save name' }).count()).toBe(0);
      expect(await seriousAxeViolations(page)).toEqual([]);
      await screenshot(page, `${who.role.toLowerCase()}-crew-settings`);
      await signOut(page);
    });
  }

  it('admin: belongs to no crew, is offered to start one, and manages accounts', async () => {
    const { page } = browser;
    await signIn(page, 'admin@demo.test', DEMO_PASSWORD);
    await page.waitForURL(/\/crews\/new$/);
    await page.getByRole('heading', { level: 1, name: 'Create your first crew' }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'admin-first-crew');

    // Being admin opens no crew.
    await page.goto(demoCrewPath);
    await page.getByText('This crew is not open to you').waitFor();

    await page.getByRole('link', { name: 'Accounts' }).click();
    await page.getByRole('heading', { level: 1, name: 'Accounts' }).waitFor();
    for (const email of [
      'owner@demo.test',
      'angler@demo.test',
      'viewer@demo.test',
      'rival@demo.test',
      'admin@demo.test',
    ]) {
      await page.getByRole('cell', { name: email, exact: true }).waitFor();
    }
    await page.getByRole('button', { name: 'Disable the account of rival@demo.test' }).waitFor();
    expect(await page.getByRole('button', { name: /the account of admin@demo\.test/ }).count()).toBe(0);
    await page.getByRole('combobox', { name: 'Site role of rival@demo.test' }).waitFor();
    expect(await page.getByRole('combobox', { name: 'Site role of admin@demo.test' }).count()).toBe(0);
    await page.getByRole('textbox', { name: 'Search accounts' }).fill('RIVAL');
    await page.getByText(/^Showing 1–1 of 1 account$/).waitFor();
    await page.getByRole('cell', { name: 'owner@demo.test', exact: true }).waitFor({ state: 'detached' });
    await page.getByRole('cell', { name: 'rival@demo.test', exact: true }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'admin-accounts');
    await signOut(page);
  });

  it('rival: sees only the other crew, and the demo crew’s address shows nothing of it', async () => {
    const { page } = browser;
    await signIn(page, 'rival@demo.test', DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: RIVAL_CREW }).waitFor();
    await page.getByRole('button', { name: /: switch crew$/ }).click();
    const menu = page.getByRole('menu');
    await menu.waitFor();
    expect(await menu.getByText(DEMO_CREW).count()).toBe(0);
    await page.keyboard.press('Escape');

    expect(demoCrewPath).not.toBe('');
    await page.goto(`${demoCrewPath}/settings`);
    await page.getByText('This crew is not open to you').waitFor();
    expect(await page.getByText(DEMO_CREW).count()).toBe(0);
    expect(await page.getByText('owner@demo.test').count()).toBe(0);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'rival-foreign-crew');
    await signOut(page);
  });

  it('on a phone-sized screen the crew home stays usable and passes axe', async () => {
    const phone = await openBrowser({ width: 390, height: 844 });
    try {
      await signIn(phone.page, 'owner@demo.test', DEMO_PASSWORD);
      await phone.page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
      expect(await seriousAxeViolations(phone.page)).toEqual([]);
      await screenshot(phone.page, 'phone-crew-home');
      // On a phone the section tabs may fold into a "More" menu; the address works either way.
      await phone.page.goto(`${demoCrewPath}/settings`);
      await phone.page.getByRole('cell', { name: 'viewer@demo.test', exact: true }).waitFor();
      expect(await seriousAxeViolations(phone.page)).toEqual([]);
      await screenshot(phone.page, 'phone-crew-settings');
    } finally {
      await phone.close();
    }
  });
});
