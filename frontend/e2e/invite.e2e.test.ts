import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, seriousAxeViolations, signIn, type Browser } from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD, freshEmail, linkIn, waitForMail } from './support/stack';

// The whole invite path: the owner invites a new address, the e-mail arrives at the fake SMTP server,
// its link is followed in another browser, the person signs up and accepts, and appears as a member.
describe('inviting a new member by e-mail', () => {
  let owner: Browser;
  let invitee: Browser;
  const email = freshEmail('newcrew');
  const name = 'Tamsin Okafor';
  const password = 'a long walk on the dock';
  let inviteLink = '';

  beforeAll(async () => {
    owner = await openBrowser();
    invitee = await openBrowser({ width: 390, height: 844 });
  });
  afterAll(async () => {
    await owner?.close();
    await invitee?.close();
  });

  it('owner sends an invite, which is listed as pending', async () => {
    const { page } = owner;
    await signIn(page, 'owner@demo.test', DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    await page.getByRole('link', { name: 'Crew & members' }).click();

    // A malformed address is refused beside the field.
    await page.getByLabel('Their e-mail').fill('not an address');
    await page.getByRole('button', { name: 'Send invite' }).click();
    await page.getByRole('heading', { name: 'Could not send the invite' }).waitFor();
    await expect(page.getByLabel('Their e-mail').getAttribute('aria-invalid')).resolves.toBe('true');
    await screenshot(page, 'invite-refused');

    await page.getByLabel('Their e-mail').fill(email);
    await page.getByLabel('Role in the crew').selectOption('angler');
    await page.getByRole('button', { name: 'Send invite' }).click();
    await page.getByText(`Invite sent to ${email}.`).waitFor();
    await page.getByRole('list', { name: 'Pending invites' }).getByText(email).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
  });

  it('the invite e-mail reaches the outbox with a link, also shown clickable on /dev/outbox', async () => {
    const mail = await waitForMail(email, new RegExp(`Join ${DEMO_CREW}`));
    inviteLink = linkIn(mail, '/invite');
    expect(new URL(inviteLink).searchParams.get('token')).toBeTruthy();

    // The outbox holds reset and invite links: the owner is refused, the site admin reads it.
    const { page } = owner;
    await page.goto('/dev/outbox');
    await page.getByText('Only the site admin reads the outbox').waitFor();
    await signIn(page, 'admin@demo.test', DEMO_PASSWORD);
    await page.goto('/dev/outbox');
    await page.getByRole('heading', { level: 1, name: 'Local outbox' }).waitFor();
    const link = page.getByRole('link', { name: inviteLink });
    await expect(link.first().getAttribute('href')).resolves.toBe(inviteLink);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'dev-outbox');
    await signIn(page, 'owner@demo.test', DEMO_PASSWORD);
  });

  it('the invited person opens the link, signs up and accepts', async () => {
    const { page } = invitee;
    await page.goto(inviteLink);
    await page.getByRole('heading', { name: DEMO_CREW }).waitFor();
    await page.getByText(/as\s+angler/).waitFor();
    await page.getByText(`Sent to ${email}`, { exact: false }).waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'invite-signed-out');

    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.waitForURL(/\/sign-up\?/);
    await expect(page.getByLabel('E-mail').inputValue()).resolves.toBe(email);
    await page.getByLabel('Your name').fill(name);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Create account' }).click();

    await page.waitForURL((url) => url.pathname === '/invite');
    const join = page.getByRole('button', { name: `Join ${DEMO_CREW}` });
    await join.waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'invite-signed-in');
    await join.click();

    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    await page.getByText('You: Angler').waitFor();
    // A phone-sized window: the section tabs may fold into a "More" menu, so go by address.
    await page.goto(`${new URL(page.url()).pathname}/settings`);
    await page.getByRole('cell', { name: email, exact: true }).waitFor();
    await page.getByRole('row', { name: new RegExp(`${name}.*\\(you\\)`) }).waitFor();
  });

  it('the owner sees the new member, and the invite is no longer pending', async () => {
    const { page } = owner;
    await page.goto('/');
    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    await page.getByRole('link', { name: 'Crew & members' }).click();
    const row = page.getByRole('row', { name: new RegExp(name) });
    await row.waitFor();
    await expect(row.getByRole('combobox').inputValue()).resolves.toBe('angler');
    await page.getByText('No invites waiting').waitFor();
  });

  it('the link cannot be used a second time', async () => {
    const { page } = invitee;
    await page.goto(inviteLink);
    await page.getByText('This invite link no longer works').waitFor();
    expect(await seriousAxeViolations(page)).toEqual([]);
  });
});
