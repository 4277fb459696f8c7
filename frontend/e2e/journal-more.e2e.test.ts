import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { largeGpx, sampleFilePath } from '@shoalbook/fixtures';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it, onTestFailed } from 'vitest';
import {
  openBrowser,
  screenshot,
  seriousAxeViolations,
  signIn,
  signOut,
  type Browser,
  apiCall,
} from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD } from './support/stack';
import { createTestEvent } from './support/journal-setup';

// Invented for this test. The lake sits at the point the fixtures' sample files assume (fixtures/README.md):
// practice on 2025-06-11/12, one competition day on 2025-06-14 from 06:30 to 15:00 (America/Chicago).
const LAKE = 'Sandreed Cove (test)';
const EVENT = 'Sandreed June Test Open';
const PHONE = { width: 390, height: 844 };
const DESK = { width: 1280, height: 900 };

async function expectNoSeriousAxe(page: Page, screen: string) {
  expect(await seriousAxeViolations(page), `axe on ${screen}`).toEqual([]);
}

describe('the journal, more: CSV import, catch editing, deletes, practice notes, a large GPX file, the viewer', () => {
  let browser: Browser;
  let crewApi = '';
  let crewPath = '';
  let lakeId = '';
  let eventId = '';
  let tmp = '';

  beforeAll(async () => {
    browser = await openBrowser(DESK);
    tmp = mkdtempSync(join(tmpdir(), 'shoalbook-journal-more-'));
    const { page } = browser;
    await signIn(page, 'angler@demo.test', DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    crewPath = new URL(page.url()).pathname.match(/^\/crews\/[^/]+/)![0];
    crewApi = crewPath;
    ({ lakeId, eventId } = await createTestEvent(page, crewApi, {
      lake: { name: LAKE, lat: 31.684, lon: -94.318 },
      event: EVENT,
      competitionDate: '2025-06-14',
      practiceDates: ['2025-06-11', '2025-06-12'],
    }));

    // The finds the sample CSV names ("Shell 01", "Rock 03", …), through the GPX import screen.
    await page.goto(`${crewPath}/import?kind=gpx&lakeId=${lakeId}&eventId=${eventId}`);
    await page.getByLabel('GPX file').setInputFiles(sampleFilePath('validGpx'));
    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByRole('button', { name: /^Import \d+ finds$/ }).click();
    await page.getByText(/\d+ finds imported/).waitFor();
  });
  afterAll(async () => {
    await browser?.close();
    if (tmp) rmSync(tmp, { recursive: true, force: true });
  });
  beforeEach((context) => {
    onTestFailed(() =>
      screenshot(browser.page, `journal-more-failed-${context.task.name.slice(0, 40).replace(/\W+/g, '-')}`),
    );
  });

  it('refuses a CSV of catches with bad rows, row by row, and imports nothing', async () => {
    const { page } = browser;
    await page.goto(`${crewPath}/import?kind=csv&eventId=${eventId}`);
    await page.getByLabel('CSV file of catches').setInputFiles(sampleFilePath('catchesInvalidCsv'));
    await page.getByRole('button', { name: 'Check the file' }).click();
    // fixtures/README.md: lines 2–12 and 14 each have one problem; lines 13 and 15 are good.
    await page.getByText('2 rows ready').waitFor();
    await page.getByText('12 rows with errors').waitFor();
    const table = page.getByRole('table', { name: 'Rows of the CSV file' });
    // The table is virtualised, so only the first rows are in the page: line 2 has the impossible time 25:61.
    await table.getByText('Needs fixing').first().waitFor();
    await table
      .getByRole('cell', { name: /^time: / })
      .first()
      .waitFor();
    const fixes = page.getByRole('region', { name: 'What to fix, line by line' });
    await expect(fixes.getByRole('listitem').count()).resolves.toBe(12);
    await fixes.getByText(/^Line 12: .+/).waitFor();
    // Line 3 is timed 05:10, before the day's 06:30 start: the fix says the allowed window.
    await fixes.getByText(/^Line 3: .*from the 06:30 start to the 15:00 check-in.*05:10 is before the start/).waitFor();
    expect(await page.getByRole('button', { name: 'Import 2 catches' }).isDisabled()).toBe(true);
    await page.getByText(/nothing is imported while a row is wrong/).waitFor();
    await expectNoSeriousAxe(page, 'CSV preview with errors');
    await screenshot(page, 'journal-csv-errors');
    expect(await apiCall<unknown[]>(page, 'GET', `${crewApi}/catches?eventId=${eventId}`)).toHaveLength(0);
  });

  it('imports a good CSV of catches in one go', async () => {
    const { page } = browser;
    await page.getByLabel('CSV file of catches').setInputFiles(sampleFilePath('catchesValidCsv'));
    await page.getByRole('button', { name: 'Check the file' }).click();
    await page.getByText('10 rows ready').waitFor();
    await page.getByText('0 rows with errors').waitFor();
    await page.getByRole('button', { name: 'Import 10 catches' }).click();
    await page.getByText('10 catches imported').waitFor();
    expect(await apiCall<unknown[]>(page, 'GET', `${crewApi}/catches?eventId=${eventId}`)).toHaveLength(10);
  });

  it('keeps the day on screen current: a catch logged elsewhere appears within seconds, without a reload', async () => {
    const { page } = browser;
    await page.goto(`${crewPath}/events/${eventId}?section=days`);
    const table = page.getByRole('table', { name: 'Catches of the day' });
    await table.getByRole('columnheader', { name: 'Time' }).waitFor();
    const rows = table.locator('tbody tr');
    await expect.poll(() => rows.count(), { timeout: 15_000 }).toBe(10);
    // Another member's write: it goes past this page's query cache, so only the day's refetch can show it.
    const [day] = await apiCall<{ id: string }[]>(page, 'GET', `${crewApi}/events/${eventId}/competition-days`);
    await apiCall(page, 'POST', `${crewApi}/catches`, {
      competitionDayId: day!.id,
      caughtAt: '14:20',
      species: 'spotted',
      weightLb: 1.85,
      fate: 'released',
    });
    // The day asks again every 5 s while visible; allow for a slow shared machine.
    await expect.poll(() => rows.count(), { timeout: 15_000 }).toBe(11);
    await page.getByRole('cell', { name: '14:20' }).first().waitFor();
  });

  it('shows the solunar period of every catch and edits one; a stale save offers to reload the latest', async () => {
    const { page } = browser;
    await page.goto(`${crewPath}/events/${eventId}?section=days`);
    const table = page.getByRole('table', { name: 'Catches of the day' });
    await table.getByRole('columnheader', { name: /Solunar/ }).waitFor();
    const periods = await table.evaluate((el) => {
      const column = [...el.querySelectorAll('thead th')].findIndex((th) => th.textContent?.startsWith('Solunar'));
      return [...el.querySelectorAll('tbody tr')]
        .filter((tr) => tr.children.length > column)
        .map((tr) => tr.children[column].textContent ?? '');
    });
    expect(periods.length).toBeGreaterThan(0);
    for (const p of periods) expect(['Major', 'Minor', 'Outside']).toContain(p);

    await table.getByRole('link', { name: /^Edit the .* at 06:48$/ }).click();
    await page.getByRole('heading', { level: 2, name: /at 06:48$/ }).waitFor();
    await page.getByText('Sun and moon at the catch').waitFor();
    await page.getByText(/8 MB/).first().waitFor();
    await expectNoSeriousAxe(page, 'catch edit');
    await screenshot(page, 'journal-catch-edit-desk');
    await page.setViewportSize(PHONE);
    await screenshot(page, 'journal-catch-edit-phone');
    await page.setViewportSize(DESK);

    const lure = page.getByRole('textbox', { name: 'Lure' });
    await lure.fill('football jig, green pumpkin');
    await page.getByRole('combobox', { name: 'Fate' }).selectOption('released');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText('Changes saved').waitFor();
    const catchId = new URL(page.url()).pathname.split('/').pop()!;
    const saved = await apiCall<{ lure: string; fate: string; version: number; weightLb: number }>(
      page,
      'GET',
      `${crewApi}/catches/${catchId}`,
    );
    expect(saved).toMatchObject({ lure: 'football jig, green pumpkin', fate: 'released' });
    // The weight was not touched, so it is still exactly what the file said (2.35 lb).
    expect(saved.weightLb).toBe(2.35);

    // Someone else saves first: the form's version is now old.
    await apiCall(page, 'PATCH', `${crewApi}/catches/${catchId}`, {
      version: saved.version,
      technique: 'changed elsewhere',
    });
    await page.getByRole('textbox', { name: 'Lure' }).fill('a change made too late');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText('This catch was changed elsewhere').waitFor();
    // The note about the earlier save went away with the first new keystroke: it no longer describes the form.
    await expect(page.getByText('Changes saved').count()).resolves.toBe(0);
    await expectNoSeriousAxe(page, 'catch edit, stale');
    await screenshot(page, 'journal-catch-stale');
    await page.getByRole('button', { name: 'Reload the latest' }).click();
    // The form is rebuilt from the other save: their technique, and the lure as last saved (the late change is gone).
    await expect.poll(() => page.getByRole('textbox', { name: 'Technique' }).inputValue()).toBe('changed elsewhere');
    await expect(page.getByRole('textbox', { name: 'Lure' }).inputValue()).resolves.toBe('football jig, green pumpkin');
    await expect(page.getByText('This catch was changed elsewhere').count()).resolves.toBe(0);

    // A time before the day's 06:30 start is refused beside the time field, saying the allowed window.
    const time = page.getByRole('textbox', { name: /^Time/ });
    await time.fill('05:00');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText('The changes were not saved').waitFor();
    await expect(time.getAttribute('aria-invalid')).resolves.toBe('true');
    const describedBy = ((await time.getAttribute('aria-describedby')) ?? '').split(' ').filter(Boolean);
    const description = await Promise.all(describedBy.map((id) => page.locator(`[id="${id}"]`).textContent()));
    expect(description.join(' ')).toMatch(/from the 06:30 start to the 15:00 check-in .*05:00 is before the start/);
    const unchanged = await apiCall<{ caughtAt: string }>(page, 'GET', `${crewApi}/catches/${catchId}`);
    expect(unchanged.caughtAt).toBe('2025-06-14T11:48:00.000Z'); // 06:48 CDT = UTC−5 (IANA tz database)

    // A corrected weight stays in the catch's history beside the weight as first recorded, with who and when.
    await page.reload();
    const history = page.getByRole('region', { name: 'History of this catch' });
    await history.getByText(/^Weight: .+ as first recorded, by .+, \d{2}:\d{2}/).waitFor();
    await page.getByRole('textbox', { name: /^Weight/ }).fill('2 lb 8 oz');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText('Changes saved').waitFor();
    await history.getByText(/^Weight: .+ → .+, by .+, \d{2}:\d{2}/).waitFor();
    const changes = await apiCall<{ field: string; from: number | null; to: number }[]>(
      page,
      'GET',
      `${crewApi}/catches/${catchId}/history`,
    );
    expect(changes.filter((c) => c.field === 'weightLb').map((c) => [c.field, c.from, c.to])).toEqual([
      ['weightLb', null, 2.35],
      ['weightLb', 2.35, 2.5], // 2 lb 8 oz = 2.5 lb (16 oz to the pound)
    ]);
    await expectNoSeriousAxe(page, 'catch history');
    await screenshot(page, 'journal-catch-history-desk');
  });

  it('keeps notes for a practice day', async () => {
    const { page } = browser;
    await page.goto(`${crewPath}/events/${eventId}?section=finds`);
    const form = page.getByRole('form', { name: /^Practice day Wed, 11 Jun 2025/ });
    await form
      .getByRole('textbox', { name: /^Notes/ })
      .fill('Wind from the south, stained water; bait balled on the main-lake points.');
    await form.getByRole('button', { name: /^Save notes/ }).click();
    await form.getByText('Saved.').waitFor();
    await page.reload();
    await expect(
      page
        .getByRole('form', { name: /^Practice day Wed, 11 Jun 2025/ })
        .getByRole('textbox', { name: /^Notes/ })
        .inputValue(),
    ).resolves.toMatch(/^Wind from the south/);
    await expectNoSeriousAxe(page, 'event practice days');
    await screenshot(page, 'journal-practice-days-desk');
    await page.setViewportSize(PHONE);
    await screenshot(page, 'journal-practice-days-phone');
    await page.setViewportSize(DESK);
  });

  it('deletes a find after a dialog that names it; a lake still in use is refused with the reason', async () => {
    const { page } = browser;
    await page.goto(`${crewPath}/events/${eventId}?section=finds`);
    await page.getByRole('link', { name: 'Rock 18' }).click();
    await page.getByRole('heading', { level: 2, name: 'Rock 18' }).waitFor();
    await page.getByRole('button', { name: 'Delete' }).click();
    const dialog = page.getByRole('alertdialog', { name: 'Delete the find “Rock 18”?' });
    await dialog.waitFor();
    await expectNoSeriousAxe(page, 'delete find dialog');
    await screenshot(page, 'journal-delete-find');
    await dialog.getByRole('button', { name: 'Delete' }).click();
    await page.waitForURL(/section=finds/);
    await page.getByRole('link', { name: 'Rock 17' }).waitFor();
    await page.getByRole('link', { name: 'Rock 18' }).waitFor({ state: 'detached' });

    await page.goto(`${crewPath}/lakes/${lakeId}`);
    await page.getByRole('button', { name: 'Delete' }).click();
    const lakeDialog = page.getByRole('alertdialog', { name: `Delete the lake “${LAKE}”?` });
    await lakeDialog.getByRole('button', { name: 'Delete' }).click();
    await lakeDialog.getByText(/The lake still has 1 event\(s\) and \d+ find\(s\); delete those first/).waitFor();
    await expectNoSeriousAxe(page, 'delete lake refused');
    await screenshot(page, 'journal-delete-lake-refused');
    await lakeDialog.getByRole('button', { name: 'Close' }).last().click();
    await page.getByRole('heading', { level: 2, name: LAKE }).waitFor();
  });

  it('chooses finds in the table and sets their kind, or deletes them, together', async () => {
    const { page } = browser;
    await page.goto(`${crewPath}/finds?lakeId=${lakeId}`);
    const table = page.getByRole('table', { name: 'Practice finds' });
    await table.getByRole('link', { name: 'Hydrilla 07' }).waitFor();
    await page.getByRole('textbox', { name: 'Filter' }).fill('Hydrilla');
    await page.getByRole('checkbox', { name: /^Select all \d+ rows that match$/ }).check();
    const bar = page.getByRole('region', { name: 'Chosen finds' });
    const chosen = Number((await bar.getByText(/^\d+ finds chosen$/).textContent())!.split(' ')[0]);
    expect(chosen).toBeGreaterThanOrEqual(2);
    await bar.getByRole('combobox', { name: 'Kind', exact: true }).selectOption('vegetation');
    await bar.getByRole('combobox', { name: 'Sub-kind' }).selectOption('hydrilla');
    await expectNoSeriousAxe(page, 'finds chosen');
    await screenshot(page, 'journal-finds-bulk');
    await bar.getByRole('button', { name: 'Set kind' }).click();
    await page.getByText(`${chosen} finds are now vegetation.`).waitFor();
    await table
      .getByRole('row')
      .filter({ hasText: 'Hydrilla 07' })
      .getByRole('cell', { name: 'hydrilla', exact: true })
      .waitFor();

    await page.getByRole('textbox', { name: 'Filter' }).fill('');
    await page.getByRole('checkbox', { name: 'Select Hump 09' }).check();
    await page.getByRole('checkbox', { name: 'Select Road bed 13' }).check();
    await bar.getByRole('button', { name: 'Delete 2 finds' }).click();
    const dialog = page.getByRole('alertdialog', { name: 'Delete 2 finds?' });
    await dialog.getByText(/Catches and stops at these finds stay/).waitFor();
    await dialog.getByRole('button', { name: 'Delete 2 finds' }).click();
    await page.getByText(/^2 finds deleted\./).waitFor();
    await table.getByRole('link', { name: 'Hump 09' }).waitFor({ state: 'detached' });
    await table.getByRole('link', { name: 'Road bed 13' }).waitFor({ state: 'detached' });
    await table.getByRole('link', { name: 'Ledge 11' }).waitFor();
  });

  it('shows a progress bar while a 2,000-waypoint GPX file goes up, then the preview', async () => {
    const { page } = browser;
    const file = join(tmp, 'practice-2000.gpx');
    writeFileSync(file, largeGpx(2000));
    await page.goto(`${crewPath}/import?kind=gpx&lakeId=${lakeId}`);
    // A slow uplink (about 1 Mbit/s), as from a boat ramp, so the upload takes long enough to watch.
    const cdp = await page.context().newCDPSession(page);
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 20,
      downloadThroughput: -1,
      uploadThroughput: 128 * 1024,
    });
    try {
      await page.getByLabel('GPX file').setInputFiles(file);
      await page.getByRole('button', { name: 'Check the file' }).click();
      await page.getByRole('progressbar').waitFor();
      await page
        .getByText(/Sending practice-2000\.gpx: \d+%|Checking practice-2000\.gpx on the server/)
        .first()
        .waitFor();
      await screenshot(page, 'journal-gpx-large-progress');
    } finally {
      await cdp.send('Network.emulateNetworkConditions', {
        offline: false,
        latency: 0,
        downloadThroughput: -1,
        uploadThroughput: -1,
      });
    }
    await page.getByText(/^\d+ ready$/).waitFor({ timeout: 60_000 });
    await expect(page.getByRole('progressbar').count()).resolves.toBe(0);
    const ready = Number((await page.getByText(/^\d+ ready$/).textContent())!.split(' ')[0]);
    const near = Number((await page.getByText(/^\d+ within 15 m of an existing find$/).textContent())!.split(' ')[0]);
    const refused = Number((await page.getByText(/^\d+ cannot be imported$/).textContent())!.split(' ')[0]);
    expect(ready + near + refused).toBe(2000);
    await page.getByRole('table').getByRole('cell', { name: 'Mark 00001' }).waitFor();
    await expectNoSeriousAxe(page, 'large GPX preview');
    await screenshot(page, 'journal-gpx-large-preview');
  });

  it('a viewer sees the catch and its sun and moon, and no edit or delete controls', async () => {
    const { page } = browser;
    await signOut(page);
    await signIn(page, 'viewer@demo.test', DEMO_PASSWORD);
    await page.goto(`${crewPath}/events/${eventId}?section=days`);
    const table = page.getByRole('table', { name: 'Catches of the day' });
    await table.getByRole('columnheader', { name: /Solunar/ }).waitFor();
    await expect(table.getByRole('link', { name: /^Edit / }).count()).resolves.toBe(0);
    await expect(table.getByRole('button', { name: /^Delete / }).count()).resolves.toBe(0);

    await table.getByRole('link', { name: '06:48' }).click();
    await page.getByText('Sun and moon at the catch').waitFor();
    await page.getByRole('heading', { name: 'The fish' }).waitFor();
    await expect(page.getByRole('button', { name: 'Save changes' }).count()).resolves.toBe(0);
    await expect(page.getByRole('button', { name: 'Delete' }).count()).resolves.toBe(0);
    await expectNoSeriousAxe(page, 'viewer catch');
    await screenshot(page, 'journal-viewer-catch');

    await page.goto(`${crewPath}/events/${eventId}?section=finds`);
    await page.getByRole('heading', { name: 'Practice days' }).waitFor();
    await page.getByText(/^Wind from the south/).waitFor();
    await expect(page.getByRole('button', { name: /^Save notes/ }).count()).resolves.toBe(0);
    await page.getByRole('link', { name: 'Rock 17' }).click();
    await page.getByRole('heading', { level: 2, name: 'Rock 17' }).waitFor();
    await expect(page.getByRole('button', { name: 'Delete' }).count()).resolves.toBe(0);
    await expect(page.getByRole('link', { name: 'Edit find' }).count()).resolves.toBe(0);
    await page.goto(`${crewPath}/lakes/${lakeId}`);
    await page.getByRole('heading', { level: 2, name: LAKE }).waitFor();
    await expect(page.getByRole('button', { name: 'Delete' }).count()).resolves.toBe(0);
  });
});
