import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it, onTestFailed } from 'vitest';
import { openBrowser, screenshot, seriousAxeViolations, signIn, type Browser } from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD } from './support/stack';

// A common phone width (CSS pixels) and an ordinary desktop one.
const PHONE = { width: 390, height: 844 };
const DESK = { width: 1280, height: 900 };

/**
 * What sticks out sideways: the page itself and the box around the table (which would scroll instead).
 * Empty when both fit. Widths in CSS pixels, whole numbers as the DOM reports them.
 */
async function sidewaysOverflow(page: Page, table: Locator): Promise<string[]> {
  const scroller = await table.evaluate((el) => {
    for (let node = el.parentElement; node; node = node.parentElement) {
      const overflowX = getComputedStyle(node).overflowX;
      if (overflowX === 'auto' || overflowX === 'scroll')
        return { scrollWidth: node.scrollWidth, clientWidth: node.clientWidth };
    }
    return null;
  });
  const doc = await page.evaluate(() => ({
    scrollWidth: document.documentElement.scrollWidth,
    clientWidth: document.documentElement.clientWidth,
  }));
  const out: string[] = [];
  if (doc.scrollWidth > doc.clientWidth) out.push(`page ${doc.scrollWidth} px wide in a ${doc.clientWidth} px window`);
  if (scroller && scroller.scrollWidth > scroller.clientWidth)
    out.push(`table ${scroller.scrollWidth} px wide in a ${scroller.clientWidth} px box`);
  return out;
}

/** The text of every cell of each body row (row header included), as a person reads it. */
async function rowTexts(table: Locator): Promise<string[]> {
  return table
    .locator('tbody tr')
    .evaluateAll((rows) => rows.map((r) => (r as HTMLElement).innerText.replace(/\s+/g, ' ').trim()));
}

describe('tables on a phone: the whole table fits 390 px, nothing scrolls sideways, nothing is dropped', () => {
  let browser: Browser;
  let crewPath = '';

  beforeAll(async () => {
    browser = await openBrowser(DESK);
    await signIn(browser.page, 'owner@demo.test', DEMO_PASSWORD);
    await browser.page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    crewPath = new URL(browser.page.url()).pathname;
  });
  afterAll(async () => {
    await browser?.close();
  });
  beforeEach((context) => {
    onTestFailed(() =>
      screenshot(browser.page, `phone-tables-failed-${context.task.name.slice(0, 40).replace(/\W+/g, '-')}`),
    );
  });

  it('crew members (settings, as the owner with role pickers and remove buttons)', async () => {
    const { page } = browser;
    await page.setViewportSize(DESK);
    await page.goto(`${crewPath}/settings`);
    const table = page.getByRole('region', { name: 'Crew members' }).getByRole('table');
    await table.getByText('viewer@demo.test', { exact: true }).waitFor();
    const onDesk = await rowTexts(table);
    expect(await sidewaysOverflow(page, table)).toEqual([]);
    await screenshot(page, 'phone-tables-members-desk');

    await page.setViewportSize(PHONE);
    await table.getByText('viewer@demo.test', { exact: true }).waitFor();
    await screenshot(page, 'phone-tables-members-phone');
    expect(await sidewaysOverflow(page, table)).toEqual([]);
    // Every name, address, role and control is still there, each visible.
    for (const name of ['Wren Halvorsen', 'Milo Farrant', 'Ines Barlow (coach)']) {
      expect(await page.getByRole('combobox', { name: `Role of ${name}` }).isVisible()).toBe(true);
    }
    for (const email of ['owner@demo.test', 'angler@demo.test', 'viewer@demo.test']) {
      expect(await table.getByText(email, { exact: true }).isVisible()).toBe(true);
    }
    expect(await page.getByRole('button', { name: 'Remove Milo Farrant from the crew' }).isVisible()).toBe(true);
    expect(await rowTexts(table)).toEqual(onDesk);
    expect(await seriousAxeViolations(page)).toEqual([]);
  });

  // One grouping counted by find and one counted by fish: the two column sets of the table.
  for (const grouping of [
    { by: 'kind', header: 'Hit rate' },
    { by: 'solunarPeriod', header: 'Share of fish' },
  ]) {
    it(`hit rates by ${grouping.by} (reports)`, async () => {
      const { page } = browser;
      await page.setViewportSize(DESK);
      await page.goto(`${crewPath}/reports/hit-rates?by=${grouping.by}`);
      const table = page
        .getByRole('table')
        .filter({ has: page.getByRole('columnheader', { name: new RegExp(grouping.header) }) });
      await table.getByRole('rowheader').first().waitFor();
      const onDesk = await rowTexts(table);
      const headers = await table.getByRole('columnheader').allTextContents();
      expect(onDesk.length).toBeGreaterThan(1);
      expect(await sidewaysOverflow(page, table)).toEqual([]);
      await screenshot(page, `phone-tables-hit-rates-${grouping.by}-desk`);

      await page.setViewportSize(PHONE);
      await table.getByRole('rowheader').first().waitFor();
      await screenshot(page, `phone-tables-hit-rates-${grouping.by}-phone`);
      expect(await sidewaysOverflow(page, table)).toEqual([]);
      // The same rows with the same figures, and every column still named for assistive technology.
      expect(await rowTexts(table)).toEqual(onDesk);
      expect(await table.getByRole('columnheader').allTextContents()).toEqual(headers);
      expect(await seriousAxeViolations(page)).toEqual([]);
    });
  }
});
