import type { Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it, onTestFailed } from 'vitest';
import { openBrowser, screenshot, seriousAxeViolations, signIn, type Browser, apiCall } from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD } from './support/stack';
import { createTestEvent } from './support/journal-setup';

// Invented for this test: one competition day on 2025-06-14 from 06:30 to 15:00 (America/Chicago), two finds.
// Named to sort after the demo's lakes, so the reports' default lake stays the demo's main one.
const LAKE = 'Willet Flowage (stops test)';
const EVENT = 'Willet Stops Test Classic';
const SHELL = 'Shell hump north';
const GRASS = 'Grass line south';
// The launch ramp, 0.05° due south of where the boat is put for the run back: 5,559.9 m (R·Δφ, mean sphere).
const RAMP = { lat: 31.65, lon: -94.32 };
const PHONE = { width: 390, height: 844 };
const DESK = { width: 1280, height: 900 };

describe('stops on a competition day: arrive, catch, leave, the timeline and the live bag', () => {
  let browser: Browser;
  let crewPath = '';
  let dayUrl = '';
  let unitsBefore: unknown = null;

  beforeAll(async () => {
    browser = await openBrowser(DESK);
    const { page } = browser;
    await signIn(page, 'angler@demo.test', DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    crewPath = new URL(page.url()).pathname.match(/^\/crews\/[^/]+/)![0];
    // Other tests change this account's units; the figures below are in pounds and inches. Put back afterwards.
    const me = await apiCall<{ user: { units: unknown } }>(page, 'GET', '/auth/me');
    unitsBefore = me.user.units;
    await apiCall(page, 'PATCH', '/auth/me', { units: { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' } });
    const { lakeId, eventId } = await createTestEvent(page, crewPath, {
      lake: { name: LAKE, lat: 31.684, lon: -94.318 },
      event: EVENT,
      competitionDate: '2025-06-14',
      practiceDates: ['2025-06-12'],
      ramp: RAMP,
    });
    for (const [name, lat, kind] of [
      [SHELL, 31.69, 'hard-bottom'],
      [GRASS, 31.675, 'vegetation'],
    ] as const)
      await apiCall(page, 'POST', `${crewPath}/finds`, {
        lakeId,
        eventId,
        practiceDate: '2025-06-12',
        name,
        lat,
        lon: -94.32,
        kind,
      });
    dayUrl = `${crewPath}/events/${eventId}?section=days`;
  });
  afterAll(async () => {
    if (unitsBefore) await apiCall(browser.page, 'PATCH', '/auth/me', { units: unitsBefore });
    await browser?.close();
  });
  beforeEach((context) => {
    onTestFailed(() => screenshot(browser.page, `stops-failed-${context.task.name.slice(0, 40).replace(/\W+/g, '-')}`));
  });

  const stops = (page: Page) => page.getByRole('region', { name: 'Stops and the day' });
  const timeline = (page: Page) => stops(page).getByRole('img', { name: /^Day timeline/ });

  it('arrives at a find, sets its lure, logs a catch there and leaves; the timeline and the live bag follow', async () => {
    const { page } = browser;
    await page.goto(dayUrl);
    await stops(page).getByText('No stops yet.', { exact: false }).waitFor();
    await expect(timeline(page).getAttribute('aria-label')).resolves.toBe('Day timeline: 0 stops, 0 catches.');
    // The running caution sits beside the arrive and leave buttons.
    await stops(page).getByRole('complementary', { name: 'Running to the next stop' }).waitFor();

    await stops(page).getByRole('combobox', { name: 'Where' }).selectOption({ label: SHELL });
    await stops(page)
      .getByRole('textbox', { name: /^Arrived at/ })
      .fill('07:00');
    await stops(page).getByRole('button', { name: 'Arrived here' }).click();
    await stops(page).getByText(`Here: ${SHELL} since 07:00`).waitFor();
    await stops(page).getByText('since 07:00, still there').waitFor();

    // The stop's lure and technique become the catch form's defaults while it is open.
    await stops(page).getByRole('button', { name: 'Edit the stop at 07:00' }).click();
    const edit = page.getByRole('form', { name: 'Edit the stop at 07:00' });
    await edit.getByRole('textbox', { name: 'Lure' }).fill('drop-shot, shad colour');
    await edit.getByRole('textbox', { name: 'Technique' }).fill('vertical over shell');
    await edit.getByRole('textbox', { name: /^Water/ }).fill('78.5');
    await edit.getByRole('button', { name: 'Save stop' }).click();
    await edit.waitFor({ state: 'detached' });
    await stops(page).getByText('Lure drop-shot, shad colour').waitFor();
    await stops(page).getByText('Water 78.5 °F', { exact: false }).waitFor();
    const catchForm = page.getByRole('form', { name: /Log a catch/ });
    await expect
      .poll(() => catchForm.getByRole('textbox', { name: 'Lure' }).inputValue())
      .toBe('drop-shot, shad colour');
    await expect(catchForm.getByRole('textbox', { name: 'Technique' }).inputValue()).resolves.toBe(
      'vertical over shell',
    );

    await catchForm.getByRole('textbox', { name: /^Time/ }).fill('07:25');
    await catchForm.getByRole('textbox', { name: /^Weight/ }).fill('3.40');
    await catchForm.getByRole('textbox', { name: /^Length/ }).fill('17');
    // The open stop's find is the catch's find unless the angler types another.
    await expect(catchForm.getByRole('combobox', { name: /^Find/ }).inputValue()).resolves.toMatch(
      new RegExp(`^${SHELL} \\(`),
    );
    await catchForm.getByRole('button', { name: 'Log catch' }).click();
    await page.getByRole('status').filter({ hasText: 'at 07:25' }).waitFor();

    // The live bag counts it; the stop holds it; the timeline shows one stop and one catch.
    const live = page.getByRole('region', { name: 'Live bag' });
    await live.getByText('1 of 5', { exact: true }).waitFor();
    await live.getByText('3.40 lb', { exact: true }).first().waitFor();
    await stops(page).getByText('1 fish', { exact: true }).waitFor();
    await expect
      .poll(() => timeline(page).getAttribute('aria-label'))
      .toBe('Day timeline: 1 stop, 1 catch, 0 stops without a bite.');
    // The catch kept the stop's lure as its own.
    const row = page.getByRole('table', { name: 'Catches of the day' }).getByRole('row').filter({ hasText: '07:25' });
    await row.getByText('drop-shot, shad colour').waitFor();

    await stops(page)
      .getByRole('textbox', { name: /^Left at/ })
      .fill('08:05');
    await stops(page).getByRole('button', { name: 'Left', exact: true }).click();
    await stops(page).getByText(`Left ${SHELL} at 08:05 after 65 min.`).waitFor();
    await stops(page).getByText('07:00–08:05 (65 min)').waitFor();
    // With the stop closed the form offers "Arrived here" again.
    await stops(page).getByRole('button', { name: 'Arrived here' }).waitFor();
  });

  it('a second find fished without a bite is a stop of its own; bad times are refused beside the field', async () => {
    const { page } = browser;
    // Before the day's 06:30 start: refused, named, nothing written.
    await stops(page).getByRole('combobox', { name: 'Where' }).selectOption({ label: GRASS });
    await stops(page)
      .getByRole('textbox', { name: /^Arrived at/ })
      .fill('05:50');
    await stops(page).getByRole('button', { name: 'Arrived here' }).click();
    await stops(page)
      .getByText(/lies outside the competition day 2025-06-14 \(06:30 to 15:00\)/)
      .first()
      .waitFor();
    // The refused arrival leaves the send queue; the list follows the device's store a moment later.
    await expect
      .poll(() =>
        stops(page)
          .getByRole('list', { name: /^Stops of/ })
          .getByRole('listitem')
          .count(),
      )
      .toBe(1);

    await stops(page)
      .getByRole('textbox', { name: /^Arrived at/ })
      .fill('08:20');
    await stops(page).getByRole('button', { name: 'Arrived here' }).click();
    await stops(page).getByText(`Here: ${GRASS} since 08:20`).waitFor();
    await stops(page).getByText('here now').waitFor();
    await stops(page)
      .getByRole('textbox', { name: /^Left at/ })
      .fill('09:10');
    await stops(page).getByRole('button', { name: 'Left', exact: true }).click();
    await stops(page).getByText('fished, no bite').waitFor();

    // A place that is no find: the position goes with it.
    await stops(page).getByRole('combobox', { name: 'Where' }).selectOption({ label: 'No find (give the position)' });
    await stops(page)
      .getByRole('textbox', { name: /^Arrived at/ })
      .fill('09:30');
    await stops(page).getByRole('button', { name: 'Arrived here' }).click();
    await stops(page).getByText('Latitude in decimal degrees, -90 to 90.').first().waitFor();
    await stops(page).getByRole('textbox', { name: 'Latitude' }).fill('31.68012');
    await stops(page).getByRole('textbox', { name: 'Longitude' }).fill('-94.31044');
    await stops(page).getByRole('button', { name: 'Arrived here' }).click();
    await stops(page).getByText('Here: No find (31.68012, -94.31044) since 09:30').waitFor();
    await stops(page)
      .getByRole('textbox', { name: /^Left at/ })
      .fill('09:45');
    await stops(page).getByRole('button', { name: 'Left', exact: true }).click();
    await stops(page).getByText('09:30–09:45 (15 min)').waitFor();
    await expect
      .poll(() => timeline(page).getAttribute('aria-label'))
      .toBe('Day timeline: 3 stops, 1 catch, 2 stops without a bite.');

    await expect(seriousAxeViolations(page)).resolves.toEqual([]);
    await screenshot(page, 'stops-day-desk');
    await page.setViewportSize(PHONE);
    await stops(page).scrollIntoViewIfNeeded();
    await expect(seriousAxeViolations(page)).resolves.toEqual([]);
    await screenshot(page, 'stops-day-phone');
    await page.setViewportSize(DESK);
  });

  it('deleting a stop keeps its catch, now in no stop, and says so', async () => {
    const { page } = browser;
    await stops(page)
      .getByRole('button', { name: `Delete the stop at ${SHELL}, 07:00` })
      .click();
    const dialog = page.getByRole('alertdialog');
    await dialog.getByText('Its 1 catch stay in the journal, unattached', { exact: false }).waitFor();
    await dialog.getByRole('button', { name: 'Delete' }).click();
    await stops(page).getByText('Stop deleted; its 1 catch is kept and now in no stop.').waitFor();
    await stops(page).getByText('1 catch of this day is in no stop', { exact: false }).waitFor();
    await expect
      .poll(() => timeline(page).getAttribute('aria-label'))
      .toBe('Day timeline: 2 stops, 1 catch, 2 stops without a bite, 1 catch in no stop.');
    // The catch itself is untouched, and still in the bag.
    await page
      .getByRole('table', { name: 'Catches of the day' })
      .getByRole('row')
      .filter({ hasText: '07:25' })
      .waitFor();
    await page.getByRole('region', { name: 'Live bag' }).getByText('1 of 5', { exact: true }).waitFor();
  });
  it('a demo competition day shows its logged stops, the tries without a bite and the time-fished reports', async () => {
    const { page } = browser;
    await page.goto(`${crewPath}/events`);
    await page.getByRole('link', { name: 'Corvane Dog Days Classic 2024' }).click();
    await page.getByRole('navigation', { name: 'Event sections' }).getByRole('link', { name: 'Days' }).click();
    await stops(page).getByText('fished, no bite').first().waitFor();
    await expect(timeline(page).getAttribute('aria-label')).resolves.toMatch(
      /^Day timeline: \d+ stops, \d+ catches, [1-9]\d* stops? without a bite/,
    );
    await expect(seriousAxeViolations(page)).resolves.toEqual([]);
    await screenshot(page, 'stops-demo-day-desk');

    // The reports: fish per hour fished, and the older event without stops marked as derived from catches.
    await page.getByRole('navigation', { name: 'Crew sections' }).getByRole('link', { name: 'Reports' }).click();
    await page.getByRole('link', { name: 'Hit rates' }).first().click();
    await page.getByRole('columnheader', { name: /Fish per hour/ }).waitFor();
    await page.getByText(/fish caught, \d+ counted/).waitFor();
    await page.getByText('derived from catches').first().waitFor();
    await expect(seriousAxeViolations(page)).resolves.toEqual([]);
    await screenshot(page, 'stops-demo-hit-rates');
  });

  it('on a phone, "use my position" takes the browser\'s fix and picks the find within 50 m, or none beyond', async () => {
    const { page, context } = browser;
    await page.setViewportSize(PHONE);
    try {
      await context.grantPermissions(['geolocation']);
      // 0.0002° north of the shell hump: R·Δφ = 22.2 m (73 ft) on the mean sphere, inside the 50 m rule.
      await context.setGeolocation({ latitude: 31.6902, longitude: -94.32, accuracy: 6 });
      await page.goto(dayUrl);
      const use = stops(page).getByRole('button', { name: 'Use my position' });
      await use.click();
      await stops(page)
        .getByText('Position filled, accurate to ±20 ft; nearest find: Shell hump north, 73 ft.', { exact: true })
        .waitFor();
      const where = stops(page).getByRole('combobox', { name: 'Where' });
      await expect(where.locator('option:checked').textContent()).resolves.toBe(SHELL);
      // The button is a thumb's target and the form fits the phone's width.
      await expect(use.boundingBox().then((b) => b?.height)).resolves.toBeGreaterThanOrEqual(44);
      await expect(page.evaluate(() => document.documentElement.scrollWidth)).resolves.toBeLessThanOrEqual(390);

      // 0.002° north: 222 m (730 ft) from the shell hump, the nearest find, so the stop is at a position of its own.
      await context.setGeolocation({ latitude: 31.692, longitude: -94.32, accuracy: 6 });
      await use.click();
      await stops(page)
        .getByText(/nearest find: Shell hump north, 730 ft, farther than 164 ft, so no find/)
        .waitFor();
      await expect(where.inputValue()).resolves.toBe('__none__');
      await expect(stops(page).getByRole('textbox', { name: 'Latitude' }).inputValue()).resolves.toBe('31.692');
      await screenshot(page, 'stops-position-phone');
    } finally {
      await context.clearPermissions();
      await page.setViewportSize(DESK);
    }
  });

  // Last in the file: the browser's fixed clock cannot be undone for its context.
  it('on the day itself, the check-in clock counts down and says when to start back, with the network off too', async () => {
    const { page, context } = browser;
    await page.setViewportSize(PHONE);
    try {
      // 12:42 on the lake clock (CDT, UTC−5) on the competition day; check-in is at 15:00.
      await page.clock.setFixedTime(new Date('2025-06-14T17:42:00Z'));
      await context.grantPermissions(['geolocation']);
      await context.setGeolocation({ latitude: RAMP.lat + 0.05, longitude: RAMP.lon, accuracy: 5 });
      await page.goto(dayUrl);
      const clock = page.getByRole('region', { name: 'Check-in' });
      await expect(clock.getByRole('timer').textContent()).resolves.toBe('2 h 18 min to check-in at 15:00');
      await clock.getByRole('textbox', { name: 'Cruising speed (mph)' }).fill('30');
      await clock.getByRole('button', { name: 'Locate for the run back' }).click();
      // 5,559.9 m at 30 mph (13.4112 m/s) takes 414.6 s: 15:00 less that is 14:53:05.
      await clock.getByText('Leave by 14:53', { exact: true }).waitFor();
      await clock.getByText(/^The ramp is 3\.5 mi away in a straight line, about 7 min at 30 mph/).waitFor();
      await clock.getByRole('complementary', { name: 'Running back to check-in' }).waitFor();
      await expect(page.evaluate(() => document.documentElement.scrollWidth)).resolves.toBeLessThanOrEqual(390);
      await screenshot(page, 'stops-check-in-clock-phone');
      await expect(seriousAxeViolations(page)).resolves.toEqual([]);

      // Nothing of it needs the server: offline, a new position (0.1° out, 11.1 km: 829 s) moves the time.
      await context.setOffline(true);
      await context.setGeolocation({ latitude: RAMP.lat + 0.1, longitude: RAMP.lon, accuracy: 5 });
      await clock.getByRole('button', { name: 'Locate for the run back' }).click();
      await clock.getByText('Leave by 14:46', { exact: true }).waitFor();
    } finally {
      await context.setOffline(false);
      await context.clearPermissions();
      await page.setViewportSize(DESK);
    }
  });
});
