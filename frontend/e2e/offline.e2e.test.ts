import type { Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it, onTestFailed } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser, apiCall } from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD } from './support/stack';
import { createTestEvent, logCatchOffline } from './support/journal-setup';

// Invented for this test: a lake and an event with one competition day from 06:30 to 15:00 (America/Chicago).
const LAKE = 'Cattail Narrows (offline test)';
const EVENT = 'Cattail Offline Test Open';
const PHONE = { width: 390, height: 844 };

/** Wait until the service worker controls the page, so it has the app shell before the network goes. */
async function untilServiceWorkerControls(page: Page) {
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
    if (!navigator.serviceWorker.controller)
      await new Promise((resolve) => navigator.serviceWorker.addEventListener('controllerchange', resolve));
  });
}

/** "Arrived here" at a position with no find, then "Left", both without signal: each says it waits to send. */
async function logStopOffline(page: Page, s: { arrived: string; left: string; lat: string; lon: string }) {
  const arrive = page.getByRole('form', { name: 'Log a stop' });
  await arrive.getByRole('combobox', { name: 'Where' }).selectOption({ label: 'No find (give the position)' });
  await arrive.getByRole('textbox', { name: 'Latitude' }).fill(s.lat);
  await arrive.getByRole('textbox', { name: 'Longitude' }).fill(s.lon);
  await arrive.getByRole('textbox', { name: /^Arrived at/ }).fill(s.arrived);
  await arrive.getByRole('button', { name: 'Arrived here' }).click();
  await page.getByText(`at ${s.arrived}: saved on this phone, waiting to send`).waitFor({ timeout: 30_000 });
  // The stop made on the phone is the open one: "Left" closes it.
  const leave = page.getByRole('form', { name: 'Leave this stop' });
  await leave.getByRole('textbox', { name: /^Left at/ }).fill(s.left);
  await leave.getByRole('button', { name: 'Left' }).click();
  await page.getByText(`at ${s.left}: saved on this phone, waiting to send`).waitFor({ timeout: 30_000 });
}

describe('on the water without signal: catches kept on the phone, sent once when the network is back', () => {
  let browser: Browser;
  let crewApi = '';
  let lakeId = '';
  let eventId = '';
  let dayUrl = '';

  beforeAll(async () => {
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, 'angler@demo.test', DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    crewApi = new URL(page.url()).pathname.match(/^\/crews\/[^/]+/)![0];
    ({ lakeId, eventId } = await createTestEvent(page, crewApi, {
      lake: { name: LAKE, lat: 32.512, lon: -95.104 },
      event: EVENT,
      competitionDate: '2025-07-19',
    }));
    dayUrl = `${crewApi}/events/${eventId}?section=days`;
  });
  afterAll(async () => {
    await browser?.close();
  });
  beforeEach((context) => {
    onTestFailed(() => {
      const page = browser.context.pages().at(-1);
      if (page) return screenshot(page, `offline-failed-${context.task.name.slice(0, 40).replace(/\W+/g, '-')}`);
    });
  });

  it(
    'logs three catches and a stop offline, keeps them through a closed tab, opens offline and sends each exactly once',
    { timeout: 240_000 },
    async () => {
      const { context, page } = browser;
      await page.goto(dayUrl);
      await page.getByRole('form', { name: /Log a catch/ }).waitFor();
      await untilServiceWorkerControls(page);
      expect(await apiCall<unknown[]>(page, 'GET', `${crewApi}/catches?eventId=${eventId}`)).toHaveLength(0);

      await context.setOffline(true);
      await logCatchOffline(page, { time: '07:12', weight: '3.41', length: '17' });
      await logCatchOffline(page, { time: '08:03', weight: '2.27', length: '15.5' });
      await logCatchOffline(page, { time: '09:48', weight: '4.06', length: '18.5' });
      await logStopOffline(page, { arrived: '06:50', left: '10:05', lat: '32.5131', lon: '-95.1052' });
      // Three catches, the arrival and the leaving.
      await page.getByRole('button', { name: /^5 waiting to send/ }).waitFor();
      await screenshot(page, 'offline-three-waiting-phone');

      // Close the tab and open the app in a new one, still offline: the service worker serves the shell and the
      // entries come back from IndexedDB.
      await page.close();
      const again = await context.newPage();
      await again.goto(dayUrl);
      const waiting = again.getByRole('region', { name: 'Not sent yet' });
      await waiting.getByText('Waiting to send').first().waitFor({ timeout: 30_000 });
      await expect(waiting.getByRole('listitem').count()).resolves.toBe(3);
      for (const time of ['07:12', '08:03', '09:48']) await waiting.getByText(`at ${time}`).waitFor();
      await again.getByRole('button', { name: /^5 waiting to send/ }).waitFor();
      const stops = again.getByRole('list', { name: 'Stops of 2025-07-19' });
      await stops.getByRole('listitem').filter({ hasText: '06:50–10:05' }).getByText('Waiting to send').waitFor();
      const noScroll = await again.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);
      expect(noScroll, 'no horizontal scroll at 390 px').toBe(true);
      await screenshot(again, 'offline-reopened-phone');

      await context.setOffline(false);
      await waiting.waitFor({ state: 'detached', timeout: 60_000 });
      const table = again.getByRole('table', { name: 'Catches of the day' });
      for (const time of ['07:12', '08:03', '09:48']) await table.getByRole('row').filter({ hasText: time }).waitFor();
      // The stop's two entries go after the catches (the queue keeps the crew's order), then nothing waits.
      await again.getByRole('button', { name: /waiting to send/ }).waitFor({ state: 'detached', timeout: 60_000 });
      await screenshot(again, 'offline-sent-phone');

      // Exactly three on the server, each as typed (in whatever weight unit the angler's preferences say).
      const catches = await apiCall<{ entered?: { weight: { value: number } } }[]>(
        again,
        'GET',
        `${crewApi}/catches?eventId=${eventId}`,
      );
      expect(catches).toHaveLength(3);
      expect(catches.map((c) => c.entered?.weight.value).sort()).toEqual([2.27, 3.41, 4.06]);
      // Exactly one stop, arrived and left at the times typed: 06:50 and 10:05 CDT (UTC−5) on 2025-07-19.
      const [day] = await apiCall<{ id: string }[]>(again, 'GET', `${crewApi}/events/${eventId}/competition-days`);
      const stopsOnServer = await apiCall<{ arrivedAt: string; leftAt: string; catchIds: string[] }[]>(
        again,
        'GET',
        `${crewApi}/stops?competitionDayId=${day.id}`,
      );
      expect(stopsOnServer).toHaveLength(1);
      const [only] = stopsOnServer;
      expect([new Date(only.arrivedAt).toISOString(), new Date(only.leftAt).toISOString()]).toEqual([
        '2025-07-19T11:50:00.000Z',
        '2025-07-19T15:05:00.000Z',
      ]);
      expect(stopsOnServer[0].catchIds).toHaveLength(3);
      await stops.getByRole('listitem').filter({ hasText: '06:50–10:05' }).getByText('3 fish').waitFor();
    },
  );

  it(
    'marks a find and enters the official figures offline, keeps both through a closed tab and sends each once',
    { timeout: 240_000 },
    async () => {
      const { context } = browser;
      const page = browser.context.pages().at(-1) ?? (await context.newPage());
      const findsUrl = `${crewApi}/finds?lakeId=${lakeId}`;
      const weighInsUrl = `${crewApi}/events/${eventId}?section=weigh-ins`;
      // Read once with signal: the lists the screens need offline are kept on the phone.
      await page.goto(findsUrl);
      await page.getByRole('heading', { name: 'Finds' }).waitFor();
      await untilServiceWorkerControls(page);
      await page.goto(weighInsUrl);
      await page.getByText('Enter the official figures').first().waitFor();
      const findsBefore = await apiCall<unknown[]>(page, 'GET', `${crewApi}/finds?lakeId=${lakeId}`);

      await context.setOffline(true);
      await page.getByText('Enter the official figures').first().click();
      const figures = page.getByRole('form', { name: 'Official weigh-in' });
      // Spelled out with its units: the angler's weight unit, which another browser test may change, does not matter.
      await figures.getByRole('textbox', { name: 'Official weight' }).fill('9 lb 12 oz');
      await figures.getByRole('button', { name: 'Save official figures' }).click();
      await figures.getByText('Waiting to send').waitFor({ timeout: 30_000 });

      await page.goto(`${crewApi}/finds/new?lakeId=${lakeId}&eventId=${eventId}`);
      const form = page.getByRole('form', { name: 'New find' });
      await form.getByRole('textbox', { name: /^Name/ }).fill('Channel swing rock (offline)');
      await form.getByRole('textbox', { name: /^Latitude/ }).fill('32.5142');
      await form.getByRole('textbox', { name: /^Longitude/ }).fill('-95.1061');
      await form.getByRole('button', { name: 'Add find' }).click();
      await form.getByText(/Channel swing rock \(offline\) is saved on this phone/).waitFor({ timeout: 30_000 });
      await page.getByRole('button', { name: /^2 waiting to send/ }).waitFor();
      await screenshot(page, 'offline-find-waiting-phone');

      await page.close();
      const again = await context.newPage();
      await again.goto(findsUrl);
      const waiting = again.getByRole('region', { name: 'Not sent yet' });
      await waiting.getByText('New find Channel swing rock (offline)').waitFor({ timeout: 30_000 });
      await again.getByRole('button', { name: /^2 waiting to send/ }).waitFor();

      await context.setOffline(false);
      await again.getByRole('button', { name: /waiting to send/ }).waitFor({ state: 'detached', timeout: 60_000 });
      await again.getByRole('link', { name: 'Channel swing rock (offline)' }).waitFor({ timeout: 30_000 });
      const finds = await apiCall<{ name: string }[]>(again, 'GET', `${crewApi}/finds?lakeId=${lakeId}`);
      expect(finds).toHaveLength(findsBefore.length + 1);
      expect(finds.filter((f) => f.name === 'Channel swing rock (offline)')).toHaveLength(1);
      const weighIns = await apiCall<{ days: { official: { officialLb: number | null } | null }[] }>(
        again,
        'GET',
        `${crewApi}/events/${eventId}/weigh-ins`,
      );
      expect(weighIns.days.map((d) => d.official?.officialLb)).toEqual([9.75]);
    },
  );
});
