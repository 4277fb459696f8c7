import type { Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it, onTestFailed } from 'vitest';
import { openBrowser, screenshot, seriousAxeViolations, signIn, type Browser } from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD, waitForMail } from './support/stack';

// The demo journal (seeded from @shoalbook/fixtures): two invented lakes, Corvane Reservoir with four events
// over two seasons (shell flats one year, grass the next) and Lake Hallowmere with two.
const MAIN_LAKE = 'Corvane Reservoir';
const RECAP_EVENT = 'Corvane Dog Days Classic 2024';

async function expectNoSeriousAxe(page: Page, screen: string) {
  expect(await seriousAxeViolations(page), `axe on ${screen}`).toEqual([]);
}

async function openReport(page: Page, tab: string) {
  await page.getByRole('navigation', { name: 'Reports' }).getByRole('link', { name: tab }).click();
}

describe('the reports, as the demo angler', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await openBrowser({ width: 1360, height: 900 });
    await signIn(browser.page, 'angler@demo.test', DEMO_PASSWORD);
    await browser.page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
  });
  afterAll(async () => {
    await browser?.close();
  });
  beforeEach((context) => {
    // A picture of the screen as it was when a step failed says more than a timeout.
    onTestFailed(() =>
      screenshot(browser.page, `reports-failed-${context.task.name.slice(0, 40).replace(/\W+/g, '-')}`),
    );
  });

  it('opens the reports from the crew navigation, with the shared filters', async () => {
    const { page } = browser;
    await page.getByRole('navigation', { name: 'Crew sections' }).getByRole('link', { name: 'Reports' }).click();
    await page.getByRole('navigation', { name: 'Reports' }).waitFor();
    const lakes = await page.getByRole('combobox', { name: 'Lake' }).locator('option').allTextContents();
    expect(lakes).toEqual(expect.arrayContaining([MAIN_LAKE, 'Lake Hallowmere']));
    await expectNoSeriousAxe(page, 'reports overview');
    await screenshot(page, 'reports-home');
  });

  it('shows hit rates by kind with a whisker per group, the numbers and the readings', async () => {
    const { page } = browser;
    await openReport(page, 'Hit rates');
    const table = page.getByRole('table', { name: /^Hit rates by group/ });
    await table.waitFor();
    const groups = (await table.getByRole('rowheader').allTextContents()).map((t) =>
      t.replace(/few (finds|fish)$/, ''),
    );
    expect(groups).toEqual(expect.arrayContaining(['Hard bottom', 'Vegetation', 'Bait']));
    expect(await page.locator('.sb-whisker').count()).toBe(groups.length);
    const readings = page.getByRole('heading', { name: 'In plain words' }).locator('xpath=..').getByRole('listitem');
    expect(await readings.count()).toBeGreaterThan(0);
    expect(await readings.first().textContent()).toMatch(/of \d+ finds fished/);
    await expectNoSeriousAxe(page, 'hit rates');
    await screenshot(page, 'reports-hit-rates');

    await page.getByRole('combobox', { name: 'Lake' }).selectOption({ label: MAIN_LAKE });
    await page.getByRole('button', { name: 'Sun & moon period' }).click();
    await page.waitForURL(/by=solunarPeriod/);
    expect(page.url()).toContain('lakeId=');
    await page.getByRole('columnheader', { name: /Share of fish/ }).waitFor();
    await screenshot(page, 'reports-hit-rates-solunar');
  });

  it('compares the events on one lake, in plain words with chance badges', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Clear filters' }).click();
    await openReport(page, 'Same lake, across events');
    const legend = page.getByRole('list', { name: 'Events in the chart' });
    await legend.waitFor();
    expect(await page.getByRole('combobox', { name: 'Lake' }).inputValue()).not.toBe('');
    const events = await legend.getByRole('listitem').allTextContents();
    expect(events).toEqual(
      expect.arrayContaining(['Corvane Early Summer Open 2023', 'Corvane Early Summer Open 2024', RECAP_EVENT]),
    );
    const changes = page.getByRole('list', { name: 'Changes between events' }).getByRole('listitem');
    expect(await changes.count()).toBeGreaterThan(0);
    const badges = await changes.allTextContents();
    expect(badges.every((t) => /more than chance|could be chance/.test(t))).toBe(true);
    expect(await changes.count()).toBeLessThanOrEqual(6);
    const showAll = page.getByRole('button', { name: /^Show all \d+ comparisons$/ });
    if (await showAll.count()) await showAll.click();
    expect(await page.locator('.sb-whisker').count()).toBeGreaterThan(events.length);
    await expectNoSeriousAxe(page, 'lake comparison');
    await screenshot(page, 'reports-lake-comparison');
  });

  it('recaps an event: days, bag, timeline, big fish; prints without the navigation', async () => {
    const { page } = browser;
    await openReport(page, 'Event recap');
    await page.getByRole('link', { name: RECAP_EVENT }).click();
    await page.getByRole('heading', { name: RECAP_EVENT, level: 3 }).waitFor();
    await page.getByRole('heading', { name: 'Bag by day' }).waitFor();
    await page.getByRole('heading', { name: /^Day 1:/ }).waitFor();
    await page.getByRole('heading', { name: /^Day 2:/ }).waitFor();
    const counted = page.getByRole('list', { name: 'Counted fish' }).first().getByRole('listitem');
    expect(await counted.count()).toBe(5);
    expect(await page.getByText('Big fish').count()).toBeGreaterThan(0);
    await page.getByRole('heading', { name: 'How the bag grew' }).waitFor();
    expect(
      await page.locator('figure[aria-label="Bag weight through each competition day"] svg path').count(),
    ).toBeGreaterThan(0);
    await expectNoSeriousAxe(page, 'event recap');
    await screenshot(page, 'reports-recap');

    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('navigation', { name: 'Crew sections' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    expect(await page.getByRole('heading', { name: 'Bag by day' }).isVisible()).toBe(true);
    await screenshot(page, 'reports-recap-print');
    await page.emulateMedia({ media: 'screen' });
  });

  it('sends the recap to a chosen member, without positions', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Send recap' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText('It contains no positions').waitFor();
    await dialog.getByRole('checkbox').first().waitFor();
    // The member whose caption shows the owner's address: the nearest ancestor holding a checkbox is its row.
    const ownerRow = dialog.getByText(/owner@demo\.test/).locator('xpath=ancestor::*[.//input[@type="checkbox"]][1]');
    await ownerRow.getByRole('checkbox').check();
    await expectNoSeriousAxe(page, 'send recap dialog');
    await screenshot(page, 'reports-recap-send');
    await dialog.getByRole('button', { name: /^Send to 1/ }).click();
    await dialog.getByText('Recap sent').waitFor();
    const mail = await waitForMail('owner@demo.test', /./);
    expect(mail.text).toContain(RECAP_EVENT);
    expect(mail.text).toMatch(/\/reports\/events\//);
    // No coordinates: nothing like 31.68… or -94.31… (the demo lake's reference point) in the mail.
    expect(mail.text + mail.html).not.toMatch(/-?\d{1,3}\.\d{4,}/);
    await dialog.getByRole('button', { name: 'Done' }).click();
  });

  it('lists every find of the event with its outcome, filterable, linked to the find', async () => {
    const { page } = browser;
    await page.getByRole('link', { name: 'Every find of this event' }).click();
    await page.getByText(/of the finds fished paid off/).waitFor();
    const table = page.getByRole('table');
    await table.waitFor();
    const all = await table.locator('tbody tr:not([aria-hidden])').count();
    expect(all).toBeGreaterThan(5);
    await page.getByRole('combobox', { name: 'Outcome' }).selectOption({ label: 'Counted fish' });
    const weighed = await table.locator('tbody tr:not([aria-hidden])').count();
    expect(weighed).toBeGreaterThan(0);
    expect(weighed).toBeLessThan(all);
    const href = await table.getByRole('link').first().getAttribute('href');
    expect(href).toMatch(/^\/crews\/[^/]+\/finds\/[^/]+$/);
    await expectNoSeriousAxe(page, 'paid-off finds');
    await screenshot(page, 'reports-paid-off-finds');
  });

  it('plots catches against the clock and weight by hour', async () => {
    const { page } = browser;
    await openReport(page, 'Timing');
    await page.getByRole('heading', { name: 'Weight by hour' }).waitFor();
    expect(await page.locator('.sb-timing-node').count()).toBeGreaterThan(50);
    expect(await page.getByText(/sunrise ≈ \d\d:\d\d/).count()).toBe(1);
    await expectNoSeriousAxe(page, 'timing');
    await screenshot(page, 'reports-timing');
  });

  it('maps the finds of a lake by kind and outcome', async () => {
    const { page } = browser;
    await openReport(page, 'Find map');
    await page.getByRole('list', { name: 'Kinds of find' }).waitFor();
    expect(await page.locator('.sb-map-find').count()).toBeGreaterThan(20);
    expect(await page.locator('.sb-map-find[data-outcome="weighed"]').count()).toBeGreaterThan(0);
    expect(await page.locator('.sb-map-catch').count()).toBeGreaterThan(0);
    await expectNoSeriousAxe(page, 'find map');
    await screenshot(page, 'reports-find-map');
  });

  it('keeps positions from a viewer and offers no recap e-mail', async () => {
    const viewer = await openBrowser({ width: 1360, height: 900 });
    try {
      const { page } = viewer;
      await signIn(page, 'viewer@demo.test', DEMO_PASSWORD);
      await page.getByRole('navigation', { name: 'Crew sections' }).getByRole('link', { name: 'Reports' }).click();
      await openReport(page, 'Find map');
      // The demo lake by name, once the map is open: it opens the first lake, and other browser tests add lakes.
      await page.waitForURL(/\/reports\/map\?.*lakeId=/);
      await page.getByRole('combobox', { name: 'Lake' }).selectOption({ label: MAIN_LAKE });
      await page.getByText('Positions are hidden').waitFor();
      expect(await page.locator('.sb-map-find').count()).toBe(0);
      await screenshot(page, 'reports-find-map-viewer');
      await openReport(page, 'Event recap');
      await page.getByRole('link', { name: RECAP_EVENT }).click();
      await page.getByRole('heading', { name: 'Bag by day' }).waitFor();
      expect(await page.getByRole('button', { name: 'Send recap' }).count()).toBe(0);
    } finally {
      await viewer.close();
    }
  });
});
