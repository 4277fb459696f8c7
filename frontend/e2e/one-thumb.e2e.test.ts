import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it, onTestFailed } from 'vitest';
import { apiCall, openBrowser, screenshot, seriousAxeViolations, signIn, type Browser } from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD } from './support/stack';
import { createTestEvent } from './support/journal-setup';

// Invented for this test: one competition day on 2025-07-19 from 06:00 to 15:00 (America/Chicago), one find.
// Named to sort after the demo's lakes, so the reports' default lake stays the demo's main one.
const LAKE = 'Wren Hollow Lake (one-thumb test)';
const EVENT = 'Wren Hollow One-Thumb Test Open';
const LEDGE = 'Ledge by the creek mouth';
const PHONE = { width: 390, height: 844 };
const DESK = { width: 1280, height: 900 };
// A thumb's target: 44 × 44 CSS px (WCAG 2.2 SC 2.5.5 Target Size (Enhanced)).
const TARGET = 44;

/** Every visible button, input, select and textarea inside the element that fails the thumb's 44 × 44 px. */
function smallTargets(root: Locator): Promise<string[]> {
  return root.evaluate((el, min) => {
    const small: string[] = [];
    for (const node of el.querySelectorAll<HTMLElement>('button, input, select, textarea')) {
      if (node.getAttribute('type') === 'hidden') continue;
      const box = node.getBoundingClientRect();
      const style = getComputedStyle(node);
      if (box.width === 0 || box.height === 0 || style.visibility === 'hidden') continue; // not shown
      if (box.width < min || box.height < min) {
        const name = node.getAttribute('aria-label') ?? node.getAttribute('name') ?? node.textContent?.trim();
        small.push(`${node.tagName.toLowerCase()} "${name}" ${Math.round(box.width)}×${Math.round(box.height)}`);
      }
    }
    return small;
  }, TARGET);
}

/** How many targets the element has (so a check of none cannot pass by finding nothing). */
function targetCount(root: Locator): Promise<number> {
  return root.evaluate(
    (el) =>
      [...el.querySelectorAll<HTMLElement>('button, input, select, textarea')].filter(
        (n) => n.getAttribute('type') !== 'hidden' && n.getBoundingClientRect().height > 0,
      ).length,
  );
}

const pageWidth = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);

describe('competition day on a phone (390 px): one screen, thumb-sized targets, readable in sunlight', () => {
  let browser: Browser;
  let dayUrl = '';
  let unitsBefore: unknown = null;

  beforeAll(async () => {
    browser = await openBrowser(DESK);
    const { page } = browser;
    await signIn(page, 'angler@demo.test', DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    const crewPath = new URL(page.url()).pathname.match(/^\/crews\/[^/]+/)![0];
    // Pounds–ounces, the steppers' whole-pound and ounce keys; put back afterwards.
    const me = await apiCall<{ user: { units: unknown } }>(page, 'GET', '/auth/me');
    unitsBefore = me.user.units;
    await apiCall(page, 'PATCH', '/auth/me', {
      units: { weight: 'lb-oz', length: 'in', depth: 'ft', temperature: 'F' },
    });
    const { lakeId, eventId } = await createTestEvent(page, crewPath, {
      lake: { name: LAKE, lat: 35.21, lon: -92.44 },
      event: EVENT,
      competitionDate: '2025-07-19',
      practiceDates: ['2025-07-17'],
      ramp: { lat: 35.2, lon: -92.44 },
      hours: { startTime: '06:00', checkInTime: '15:00' },
    });
    await apiCall(page, 'POST', `${crewPath}/finds`, {
      lakeId,
      eventId,
      practiceDate: '2025-07-17',
      name: LEDGE,
      lat: 35.215,
      lon: -92.44,
      kind: 'hard-bottom',
    });
    dayUrl = `${crewPath}/events/${eventId}?section=days`;
    await page.setViewportSize(PHONE);
    // 12:42 on the lake clock (CDT, UTC−5) on the competition day, so the check-in clock shows its fields.
    // The browser's fixed clock cannot be undone for its context: this file's own browser.
    await page.clock.setFixedTime(new Date('2025-07-19T17:42:00Z'));
  });
  afterAll(async () => {
    if (unitsBefore) await apiCall(browser.page, 'PATCH', '/auth/me', { units: unitsBefore });
    await browser?.close();
  });
  beforeEach((context) => {
    onTestFailed(() =>
      screenshot(browser.page, `one-thumb-failed-${context.task.name.slice(0, 40).replace(/\W+/g, '-')}`),
    );
  });

  const catchForm = (page: Page) => page.getByRole('form', { name: /^Log a catch/ });
  const stops = (page: Page) => page.getByRole('region', { name: 'Stops and the day' });

  it('every button, field and list of the stop, catch and check-in forms is at least 44 × 44 px; nothing scrolls sideways', async () => {
    const { page } = browser;
    await page.goto(dayUrl);
    await catchForm(page).waitFor();
    const forms = {
      'log a stop': page.getByRole('form', { name: 'Log a stop' }),
      'log a catch': catchForm(page),
      'check-in': page.getByRole('region', { name: 'Check-in' }),
      'live bag': page.getByRole('region', { name: 'Live bag' }),
    };
    for (const [name, form] of Object.entries(forms)) {
      expect(await targetCount(form), name).toBeGreaterThan(0);
      expect(await smallTargets(form), name).toEqual([]);
    }
    // With coordinates instead of a find, the latitude and longitude fields too.
    await catchForm(page).getByRole('checkbox', { name: 'Attribute from coordinates' }).click();
    await catchForm(page).getByRole('textbox', { name: 'Latitude' }).waitFor();
    expect(await smallTargets(catchForm(page))).toEqual([]);
    await catchForm(page).getByRole('checkbox', { name: 'Attribute from coordinates' }).click();
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);

    // Arrived: the leave form and the stop's edit form.
    await stops(page).getByRole('combobox', { name: 'Where' }).selectOption({ label: LEDGE });
    await stops(page)
      .getByRole('textbox', { name: /^Arrived at/ })
      .fill('07:10');
    await stops(page).getByRole('button', { name: 'Arrived here' }).click();
    const leave = page.getByRole('form', { name: 'Leave this stop' });
    await leave.waitFor();
    expect(await targetCount(leave)).toBeGreaterThan(0);
    expect(await smallTargets(leave)).toEqual([]);
    // The whole stops panel too: the stop's edit and delete buttons in its list.
    expect(await smallTargets(stops(page))).toEqual([]);
    await stops(page).getByRole('button', { name: 'Edit the stop at 07:10' }).click();
    const edit = page.getByRole('form', { name: 'Edit the stop at 07:10' });
    await edit.waitFor();
    expect(await smallTargets(edit)).toEqual([]);
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);
    await edit.getByRole('button', { name: 'Cancel' }).click();
    await edit.waitFor({ state: 'detached' });
  });

  it('logs a catch by thumb alone: the live bag above the form, weight by the steppers, save in reach', async () => {
    const { page } = browser;
    const form = catchForm(page);
    const live = page.getByRole('region', { name: 'Live bag' });
    // The live bag sits above the form on a phone.
    const [bagBox, formBox] = await Promise.all([live.boundingBox(), form.boundingBox()]);
    expect(bagBox!.y + bagBox!.height).toBeLessThanOrEqual(formBox!.y);

    await form.getByRole('textbox', { name: /^Time/ }).fill('07:30');
    await form.getByRole('combobox', { name: 'Species' }).selectOption('spotted');
    // 2 lb 5 oz by the keys: up a pound twice, up an ounce five times, from an empty field.
    for (const key of ['1 lb', '1 lb', '1 oz', '1 oz', '1 oz', '1 oz', '1 oz'])
      await form.getByRole('button', { name: `Weight up ${key}` }).click();
    await expect(form.getByRole('textbox', { name: /^Weight/ }).inputValue()).resolves.toBe('2-5');
    await form.getByRole('textbox', { name: /^Length/ }).fill('15.5');
    await form.getByRole('combobox', { name: 'Fate' }).selectOption('weighed');

    // Save is within the screen (it stays at the foot while the form scrolls), as wide as the form.
    const save = form.getByRole('button', { name: 'Log catch' });
    const saveBox = (await save.boundingBox())!;
    expect(saveBox.y + saveBox.height).toBeLessThanOrEqual(PHONE.height);
    expect(saveBox.height).toBeGreaterThanOrEqual(TARGET);
    expect(saveBox.width).toBeGreaterThanOrEqual(formBox!.width - 40);
    await screenshot(page, 'one-thumb-catch-phone');
    await save.click();
    await page.getByRole('status').filter({ hasText: 'Logged 2 lb 5.0 oz spotted at 07:30' }).waitFor();
    await live.getByText('1 of 5', { exact: true }).waitFor();

    // The species just used comes first on this phone.
    await expect(
      form.getByRole('combobox', { name: 'Species' }).locator('option').first().getAttribute('value'),
    ).resolves.toBe('spotted');
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);
  });

  it('the entry screen passes axe with the enhanced contrast rule (7:1) on a phone; the desk keeps its layout', async () => {
    const { page } = browser;
    await page.goto(dayUrl);
    await catchForm(page).waitFor();
    // The competition day's screen: the stop, catch and check-in forms and the live bag, in the phone's theme.
    await expect(
      seriousAxeViolations(page, {
        include: ['[data-light-theme="light_high_contrast"]'],
        enable: ['color-contrast-enhanced'],
      }),
    ).resolves.toEqual([]);
    await screenshot(page, 'one-thumb-day-phone');

    // On a desk the steppers are not shown and the form keeps its usual theme, whose muted text is below 7:1
    // (so the rule above has something to find when the phone's theme is missing).
    await page.setViewportSize(DESK);
    try {
      await expect(page.locator('[data-light-theme="light_high_contrast"]').count()).resolves.toBe(0);
      const desk = await seriousAxeViolations(page, {
        include: ['form[aria-label^="Log a catch"]'],
        enable: ['color-contrast-enhanced'],
      });
      expect(desk.some((v) => v.includes('color-contrast-enhanced'))).toBe(true);
      await expect(catchForm(page).getByRole('button', { name: 'Weight up 1 oz' }).isVisible()).resolves.toBe(false);
    } finally {
      await page.setViewportSize(PHONE);
    }
  });
});
