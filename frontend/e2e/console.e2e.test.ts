import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openBrowser, signIn, type Browser } from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD } from './support/stack';

// Every screen the crew navigation and the report tabs reach, as the owner of the demo crew: the browser's
// console stays free of warnings and errors (React's and Primer's included), so a real problem stands out.
describe('a quiet console', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('logs no warning or error on any screen of the crew and its reports', { timeout: 180_000 }, async () => {
    const { page } = browser;
    await signIn(page, 'owner@demo.test', DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    const logged: string[] = [];
    page.on('console', (m) => {
      if (m.type() === 'warning' || m.type() === 'error') logged.push(`${new URL(page.url()).pathname}: ${m.text()}`);
    });
    page.on('pageerror', (e) => logged.push(`${new URL(page.url()).pathname}: ${e.message}`));

    // Each link of a section bar in turn (read from the screen, so a new section is visited too).
    const visited: string[] = [];
    const visitEach = async (nav: string) => {
      const links = page.getByRole('navigation', { name: nav }).getByRole('link');
      const names = await links.allInnerTexts();
      for (const name of names) {
        await links.filter({ hasText: name }).first().click();
        await page.waitForLoadState('networkidle');
        visited.push(`${nav} › ${name.trim()}`);
      }
    };
    await visitEach('Crew sections');
    await page.getByRole('navigation', { name: 'Crew sections' }).getByRole('link', { name: 'Reports' }).click();
    await visitEach('Reports');
    // An event's own screen and each of its sections (days, stops, weigh-ins …).
    await page.getByRole('navigation', { name: 'Crew sections' }).getByRole('link', { name: 'Events' }).click();
    await page
      .getByRole('link', { name: /Dog Days Classic 2024/ })
      .first()
      .click();
    await visitEach('Event sections');
    expect(visited.length, visited.join(', ')).toBeGreaterThanOrEqual(15);

    expect(logged).toEqual([]);
  });
});
