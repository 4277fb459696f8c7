import type { ChildProcess } from 'node:child_process';
import type { CDPSession, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it, onTestFailed } from 'vitest';
import { profile } from '../../scripts/lib/profile.mjs';
import { startBackend } from '../../scripts/lib/services.mjs';
import { apiCall, openBrowser, screenshot, signIn, type Browser } from './support/browser';
import { DEMO_CREW, DEMO_PASSWORD } from './support/stack';
import { createTestEvent, logCatchOffline } from './support/journal-setup';

// A second back end on the browser tests' database, on a port of its own, so this test may kill it at will
// (global-setup.ts owns the main one, which the other browser tests share).
const ownServer = { ...profile('test'), port: profile('test').port + 50 };
const OWN_URL = `http://127.0.0.1:${ownServer.port}`;
const SERVER_ENV = { THROTTLE_AUTH_LIMIT: '1000', THROTTLE_ACCOUNT_LIMIT: '1000' };

// Invented for this test: a lake and an event with one competition day from 06:30 to 15:00 (America/Chicago).
const LAKE = 'Sawgrass Elbow (restart test)';
const EVENT = 'Sawgrass Restart Test Open';
const PHONE = { width: 390, height: 844 };
const CATCHES = [
  { time: '06:41', weight: '2.12', length: '14.5', utc: '2025-07-19T11:41:00.000Z' },
  { time: '07:18', weight: '3.05', length: '16.5', utc: '2025-07-19T12:18:00.000Z' },
  { time: '08:26', weight: '1.87', length: '14', utc: '2025-07-19T13:26:00.000Z' },
  { time: '09:53', weight: '4.33', length: '19', utc: '2025-07-19T14:53:00.000Z' },
  { time: '11:07', weight: '2.64', length: '15.5', utc: '2025-07-19T16:07:00.000Z' },
  { time: '12:35', weight: '3.48', length: '17', utc: '2025-07-19T17:35:00.000Z' },
];
/**
 * Added to every request of the page once it is back online (Chromium's network emulation), so that the six
 * entries, sent one at a time, take seconds to drain: the kill after the first acknowledgement then finds
 * the rest still waiting, however fast the machine is.
 */
const SLOW_SIGNAL_LATENCY_MS = 400;

/** The client-made record ids of the catches waiting in the page's send queue (IndexedDB), in order. */
function waitingCatchIds(page: Page): Promise<string[]> {
  return page.evaluate(
    () =>
      new Promise<string[]>((resolve, reject) => {
        const open = indexedDB.open('shoalbook-device');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const read = open.result.transaction('sendQueue').objectStore('sendQueue').getAll();
          read.onerror = () => reject(read.error);
          read.onsuccess = () => {
            const entries = read.result as { seq: number; kind: string; recordId?: string }[];
            resolve(entries.filter((e) => e.kind === 'log-catch').map((e) => e.recordId ?? ''));
            open.result.close();
          };
        };
      }),
  );
}

/** SIGKILL: no shutdown hooks, no answer to a request in flight, as when the machine loses power. */
function killHard(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    child.once('exit', () => resolve());
    child.kill('SIGKILL');
  });
}

describe('the server killed in the middle of draining the send queue and started again', () => {
  let server: ChildProcess | undefined;
  let browser: Browser;
  let crewApi = '';
  let eventId = '';
  let dayUrl = '';

  beforeAll(async () => {
    server = await startBackend(ownServer, SERVER_ENV, 'ignore');
    browser = await openBrowser(PHONE, OWN_URL);
    const { page } = browser;
    await signIn(page, 'angler@demo.test', DEMO_PASSWORD);
    await page.getByRole('heading', { level: 1, name: DEMO_CREW }).waitFor();
    crewApi = new URL(page.url()).pathname.match(/^\/crews\/[^/]+/)![0];
    ({ eventId } = await createTestEvent(page, crewApi, {
      lake: { name: LAKE, lat: 31.874, lon: -94.962 },
      event: EVENT,
      competitionDate: '2025-07-19',
    }));
    dayUrl = `${crewApi}/events/${eventId}?section=days`;
  });
  afterAll(async () => {
    await browser?.close();
    if (server) await killHard(server);
  });
  beforeEach((context) => {
    onTestFailed(() => {
      const page = browser.context.pages().at(-1);
      if (page) return screenshot(page, `drain-restart-failed-${context.task.name.slice(0, 40).replace(/\W+/g, '-')}`);
    });
  });

  it(
    'logs six catches offline, loses the server after the first is acknowledged, and ends with each once',
    { timeout: 300_000 },
    async () => {
      const { context, page } = browser;
      await page.goto(dayUrl);
      await page.getByRole('form', { name: /Log a catch/ }).waitFor();
      await page.evaluate(async () => {
        await navigator.serviceWorker.ready;
        if (!navigator.serviceWorker.controller)
          await new Promise((resolve) => navigator.serviceWorker.addEventListener('controllerchange', resolve));
      });
      // Polled from Node (the context's own request client, with the session cookie), never through the page.
      const onServer = () =>
        apiCall<{ id: string; caughtAt: string; entered?: { weight: { value: number } } }[]>(
          page,
          'GET',
          `${crewApi}/catches?eventId=${eventId}`,
        );
      expect(await onServer()).toHaveLength(0);

      await context.setOffline(true);
      for (const c of CATCHES) await logCatchOffline(page, c);
      await page.getByRole('button', { name: /^6 waiting to send/ }).waitFor();
      const clientIds = await waitingCatchIds(page);
      expect(clientIds).toHaveLength(6);
      expect(new Set(clientIds).size).toBe(6);

      const cdp: CDPSession = await context.newCDPSession(page);
      await cdp.send('Network.enable');
      await context.setOffline(false);
      await cdp.send('Network.emulateNetworkConditions', {
        offline: false,
        latency: SLOW_SIGNAL_LATENCY_MS,
        downloadThroughput: -1,
        uploadThroughput: -1,
      });

      // Kill as soon as the server holds at least one of the six; the test relies on the rest still waiting
      // (see SLOW_SIGNAL_LATENCY_MS) and checks it: a drain that outran the kill fails here, not silently.
      let acknowledged = 0;
      const deadline = Date.now() + 60_000;
      while (acknowledged === 0) {
        if (Date.now() > deadline) throw new Error('no catch reached the server within 60 s of going online');
        acknowledged = (await onServer()).length;
      }
      await killHard(server!);
      expect(acknowledged, 'the kill came before the last catch was acknowledged').toBeLessThan(CATCHES.length);
      await page.getByRole('button', { name: /waiting to send/ }).waitFor();
      await screenshot(page, 'drain-restart-server-down-phone');

      server = await startBackend(ownServer, SERVER_ENV, 'ignore');
      // Nothing prods the page: its own retry timer (backoff with jitter) finds the server back.
      // The badge goes only when the queue is empty: nothing waiting and nothing refused ("needs you").
      const badge = page.getByRole('button', { name: /: show the send queue$/ });
      await badge.waitFor({ state: 'detached', timeout: 120_000 });
      const table = page.getByRole('table', { name: 'Catches of the day' });
      for (const c of CATCHES) await table.getByRole('row').filter({ hasText: c.time }).waitFor();
      await screenshot(page, 'drain-restart-sent-phone');

      // Exactly the six typed, each once: by the ids the phone made and the times and weights typed.
      const catches = await onServer();
      expect(catches).toHaveLength(6);
      expect(catches.map((c) => c.id).sort()).toEqual([...clientIds].sort());
      expect(catches.map((c) => new Date(c.caughtAt).toISOString()).sort()).toEqual(CATCHES.map((c) => c.utc));
      expect(catches.map((c) => c.entered?.weight.value).sort()).toEqual(CATCHES.map((c) => Number(c.weight)).sort());
    },
  );
});
