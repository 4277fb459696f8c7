import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, seriousAxeViolations, signIn, signOut, type Browser } from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD } from './support/stack';

const HERE = dirname(fileURLToPath(import.meta.url));
const GPX_FILE = join(HERE, 'files', 'practice-waypoints.gpx');

// Invented for this test: a lake, an event with two practice days and one competition day.
const LAKE = 'Heron Bend Reservoir';
const EVENT = 'Spring Shad Open (test)';
const COMPETITION_DAY = '2025-04-12';

async function expectNoSeriousAxe(page: Page, screen: string) {
  const violations = await seriousAxeViolations(page);
  expect(violations, `axe on ${screen}`).toEqual([]);
}

/** Type one catch by keyboard only, starting with focus on the time field; Enter logs it. */
async function logCatchByKeyboard(
  page: Page,
  c: { time: string; weight: string; length: string; find: string; fateKey?: string },
) {
  const time = page.getByRole('textbox', { name: /^Time/ });
  await expect(time.evaluate((el) => el === document.activeElement)).resolves.toBe(true);
  await page.keyboard.press('Control+A');
  await page.keyboard.type(c.time);
  await page.keyboard.press('Tab'); // species (kept from the last catch)
  await page.keyboard.press('Tab');
  await page.keyboard.type(c.weight);
  await page.keyboard.press('Tab');
  await page.keyboard.type(c.length);
  await page.keyboard.press('Tab');
  await page.keyboard.type(c.find);
  if (c.fateKey) {
    await page.keyboard.press('Tab'); // attribute-from-coordinates checkbox
    await page.keyboard.press('Tab'); // fate
    await page.keyboard.type(c.fateKey);
  }
  await page.keyboard.press('Enter');
  await page
    .getByRole('status')
    .filter({ hasText: `at ${c.time}` })
    .waitFor();
}

describe('the journal, as the demo angler', () => {
  let browser: Browser;
  let crewPath = '';
  let eventUrl = '';

  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('creates a lake', async () => {
    const { page } = browser;
    await signIn(page, 'angler@demo.test', DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    crewPath = new URL(page.url()).pathname;

    await page.getByRole('navigation', { name: 'Crew sections' }).getByRole('link', { name: 'Lakes' }).click();
    await page.getByRole('heading', { name: 'Lakes', level: 2 }).waitFor();
    await expectNoSeriousAxe(page, 'lakes');
    await screenshot(page, 'journal-lakes');

    await page.getByRole('link', { name: 'New lake' }).click();
    await page.getByRole('heading', { name: 'New lake' }).waitFor();
    await page.getByRole('textbox', { name: /^Name/ }).fill(LAKE);
    await page.getByRole('textbox', { name: /^Region/ }).fill('North test county');
    await page.getByRole('combobox', { name: /^Time zone/ }).selectOption('America/Chicago');
    await page.getByRole('textbox', { name: /^Latitude/ }).fill('34.4231');
    await page.getByRole('textbox', { name: /^Longitude/ }).fill('-86.1712');
    await page.getByRole('textbox', { name: /^Area/ }).fill('6200');
    await expectNoSeriousAxe(page, 'new lake form');
    await screenshot(page, 'journal-lake-form');
    await page.getByRole('button', { name: 'Add lake' }).click();
    await page.getByRole('heading', { name: LAKE, level: 2 }).waitFor();
    await page.getByText('No events yet').waitFor();
    await expectNoSeriousAxe(page, 'lake page');
  });

  it('creates an event with the common-practice rules prefilled', async () => {
    const { page } = browser;
    await page.getByRole('link', { name: 'New event' }).click();
    await page.getByRole('heading', { name: 'New event' }).waitFor();
    await expect(page.getByRole('textbox', { name: /^Fish counted per day/ }).inputValue()).resolves.toBe('5');
    await expect(page.getByRole('textbox', { name: /^Minimum length/ }).inputValue()).resolves.toBe('12');
    await page
      .getByText(/state wildlife agency/)
      .first()
      .waitFor();

    await page.getByRole('textbox', { name: /^Event name/ }).fill(EVENT);
    await page.getByRole('textbox', { name: /^Organiser/ }).fill('Test trail');
    const practice = page.getByRole('group', { name: 'Practice days' });
    await practice.getByRole('button', { name: 'Add a day' }).click();
    await practice.getByLabel('Practice days: day 1').fill('2025-04-10');
    await practice.getByRole('button', { name: 'Add a day' }).click();
    await expect(practice.getByLabel('Practice days: day 2').inputValue()).resolves.toBe('2025-04-11');
    const competition = page.getByRole('group', { name: 'Competition days' });
    await competition.getByRole('button', { name: 'Add a day' }).click();
    await competition.getByLabel('Competition days: day 1').fill(COMPETITION_DAY);
    await expectNoSeriousAxe(page, 'new event form');
    await screenshot(page, 'journal-event-form');
    await page.getByRole('button', { name: 'Add event' }).click();

    await page.getByRole('heading', { name: EVENT, level: 2 }).waitFor();
    eventUrl = page.url();
    await page.getByText('Sat, 12 Apr 2025').first().waitFor();
    await expectNoSeriousAxe(page, 'event overview');
    await screenshot(page, 'journal-event-overview');
  });

  it('imports a GPX file: preview with the duplicate and the bad row flagged, then commit', async () => {
    const { page } = browser;
    await page.goto(`${eventUrl}?section=finds`);
    await page.getByText('No practice finds for this event').waitFor();
    await page.getByRole('link', { name: 'Import GPX' }).first().click();
    await page.getByRole('button', { name: 'Check the file' }).waitFor();
    await page.getByLabel('GPX file').setInputFiles(GPX_FILE);
    await page.getByRole('button', { name: 'Check the file' }).click();

    await page.getByText('3 ready').waitFor();
    await page.getByText('1 within 15 m of an existing find').waitFor();
    await page.getByText('1 cannot be imported').waitFor();
    await page.getByRole('cell', { name: /earlier in this file/ }).waitFor();
    await page.getByRole('cell', { name: /out of range/ }).waitFor();
    await expectNoSeriousAxe(page, 'GPX preview');
    await screenshot(page, 'journal-gpx-preview');

    await page.getByRole('button', { name: 'Import 3 finds' }).click();
    await page.getByText('3 finds imported').waitFor();

    await page.goto(`${eventUrl}?section=finds`);
    await page.getByRole('link', { name: 'Long shell flat' }).waitFor();
    await expectNoSeriousAxe(page, 'event finds');
    await screenshot(page, 'journal-event-finds');
  });

  it('logs three catches by keyboard only and shows the counted bag with the dead-fish penalty', async () => {
    const { page } = browser;
    await page.goto(`${eventUrl}?section=days`);
    await page.getByRole('form', { name: /Log a catch/ }).waitFor();

    await logCatchByKeyboard(page, { time: '07:10', weight: '3.45', length: '17', find: 'Long shell flat' });
    await logCatchByKeyboard(page, { time: '08:25', weight: '2.10', length: '15', find: 'Channel swing rock' });
    await logCatchByKeyboard(page, {
      time: '09:40',
      weight: '4.02',
      length: '18.5',
      find: 'Grass point',
      fateKey: 'd',
    });

    const table = page.getByRole('table', { name: 'Catches of the day' });
    await table.getByRole('row').filter({ hasText: '09:40' }).filter({ hasText: 'Dead' }).waitFor();
    await expect(table.getByRole('row').filter({ hasText: 'Long shell flat' }).count()).resolves.toBe(1);
    await expectNoSeriousAxe(page, 'competition day with catches');
    await screenshot(page, 'journal-catches-desk');

    await page.getByRole('navigation', { name: 'Event sections' }).getByRole('link', { name: 'Weigh-ins' }).click();
    const bag = page.getByRole('group', { name: 'Bag of Sat, 12 Apr 2025' });
    await bag.getByText('3 of 5').waitFor();
    // 3.45 + 2.10 + 4.02 = 9.57 lb gross; one dead fish at the default 0.25 lb (common practice, set per event).
    // No scale slip entered yet, so each figure is Shoalbook's own, and the penalty is itemised below.
    await bag.getByText('9.57 lb', { exact: true }).waitFor();
    await bag.getByText('0.25 lb', { exact: true }).waitFor();
    await bag.getByText('9.32 lb', { exact: true }).waitFor();
    await page.getByText('Penalties: dead fish 0.25 lb.').waitFor();
    await expectNoSeriousAxe(page, 'weigh-ins');
    await screenshot(page, 'journal-weigh-ins-desk');

    // The scale's slip, entered and then corrected: both stay in the day's history, with who and when (the
    // date is named too, as the change was made on another day than the competition day).
    const day = page.getByRole('region', { name: 'Sat, 12 Apr 2025' });
    await day.getByText('Enter the official figures').click();
    const official = day.getByRole('textbox', { name: 'Official weight' });
    await official.fill('9.35');
    await day.getByRole('button', { name: 'Save official figures' }).click();
    await day.getByText('Saved; the official figures now count.').waitFor();
    await official.fill('9.30');
    await day.getByRole('button', { name: 'Save official figures' }).click();
    await day.getByText('Saved; the official figures now count.').waitFor();
    await day.getByText('Who changed the official figures, and when').click();
    const history = day.getByRole('region', { name: 'History of the official figures' });
    await history.getByText(/^Official weight: 9\.35 lb → 9\.3 ?0? lb, by .+, \d{2}:\d{2} on .+$/).waitFor();
    await history.getByText(/^Official weight: 9\.35 lb as first recorded, by .+, \d{2}:\d{2} on .+$/).waitFor();
    await expectNoSeriousAxe(page, 'weigh-in history');
    await screenshot(page, 'journal-weigh-in-history-desk');

    await page.setViewportSize({ width: 390, height: 844 });
    await screenshot(page, 'journal-weigh-ins-phone');
    await page.goto(`${eventUrl}?section=days`);
    await page.getByRole('form', { name: /Log a catch/ }).waitFor();
    await expectNoSeriousAxe(page, 'competition day on a phone');
    await screenshot(page, 'journal-catches-phone');
    await page.setViewportSize({ width: 1280, height: 900 });
  });

  it('exports the journal as JSON and CSV, with the note that the file holds positions', async () => {
    const { page } = browser;
    await page.goto(`${crewPath}/import?kind=export`);
    await page.getByText(/holds the position of every find/).waitFor();
    await expectNoSeriousAxe(page, 'export');
    await screenshot(page, 'journal-export');

    const [jsonDownload] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Export journal (JSON)' }).click(),
    ]);
    const json = JSON.parse(readFileSync((await jsonDownload.path())!, 'utf8'));
    expect(json.format).toBe('shoalbook-journal');
    expect(json.lakes.map((l: { name: string }) => l.name)).toContain(LAKE);
    expect(
      json.catches.filter((c: { eventId: string }) => c.eventId === new URL(eventUrl).pathname.split('/').pop()),
    ).toHaveLength(3);

    const [csvDownload] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Export journal (CSV)' }).click(),
    ]);
    const csv = readFileSync((await csvDownload.path())!, 'utf8');
    expect(csv).toContain('Long shell flat');

    await page.getByLabel('Lake for the GPX file').selectOption({ label: LAKE });
    const [gpxDownload] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Export finds (GPX)' }).click(),
    ]);
    const gpx = readFileSync((await gpxDownload.path())!, 'utf8');
    expect(gpx).toMatch(/<gpx [^>]*xmlns="http:\/\/www.topografix.com\/GPX\/1\/1"/);
    expect(gpx).toContain('<name>Long shell flat</name>');
  });

  it('the other journal screens pass axe: finds, catches, events', async () => {
    const { page } = browser;
    for (const [section, heading] of [
      ['finds', 'Finds'],
      ['catches', 'Catches'],
      ['events', 'Events'],
    ] as const) {
      await page.goto(`${crewPath}/${section}`);
      await page.getByRole('heading', { name: heading, level: 2 }).waitFor();
      await page.getByRole('table').first().waitFor();
      await expectNoSeriousAxe(page, section);
      await screenshot(page, `journal-${section}`);
    }
    // The events list tells each event's fish by the one bag rule (three fish, all counted) and its weight as the
    // weigh-in screen totals it: the official 9.30 lb entered from the scale slip above, not the log's 9.32 lb.
    const row = page.getByRole('row').filter({ has: page.getByRole('link', { name: EVENT }) });
    await row.getByRole('cell', { name: '3 (3 counted)', exact: true }).waitFor();
    await row.getByRole('cell', { name: '9.30 lb (official)', exact: true }).waitFor();
    await page.goto(`${eventUrl}?section=finds`);
    await page.getByRole('link', { name: 'Long shell flat' }).click();
    await page.getByRole('heading', { name: 'Long shell flat', level: 2 }).waitFor();
    await page.getByText('Sun and moon when marked').waitFor();
    await expectNoSeriousAxe(page, 'find detail');
    await screenshot(page, 'journal-find-detail');
  });

  it('a viewer reads the event but gets no write controls', async () => {
    const { page } = browser;
    await signOut(page);
    await signIn(page, 'viewer@demo.test', DEMO_PASSWORD);
    await page.goto(`${eventUrl}?section=days`);
    await page.getByRole('table', { name: 'Catches of the day' }).waitFor();
    await expect(page.getByRole('form', { name: /Log a catch/ }).count()).resolves.toBe(0);
    await expect(page.getByRole('link', { name: 'Edit event' }).count()).resolves.toBe(0);
    await expect(page.getByRole('button', { name: /Delete the catch/ }).count()).resolves.toBe(0);
    await expect(
      page.getByRole('navigation', { name: 'Crew sections' }).getByRole('link', { name: 'Files' }).count(),
    ).resolves.toBe(0);
    await expectNoSeriousAxe(page, 'viewer competition day');
    await screenshot(page, 'journal-viewer-day');
  });
});
