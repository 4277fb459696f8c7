import { mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { CSRF_HEADER } from '@shoalbook/shared';
import { BASE_URL } from './stack';

const HERE = dirname(fileURLToPath(import.meta.url));
const SCREENSHOTS = join(HERE, '..', 'screenshots');
const AXE_SOURCE = readFileSync(join(HERE, '..', '..', '..', 'node_modules', 'axe-core', 'axe.min.js'), 'utf8');

/** Flags for Debian's chromium on a machine with no outside network (see the handbook's stack notes). */
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export interface Browser {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/**
 * A fresh chromium profile (its own cookies) in a new temporary directory, removed on close. `baseURL` is the
 * test server of global-setup.ts unless a test runs its own.
 */
export async function openBrowser(viewport = { width: 1280, height: 900 }, baseURL = BASE_URL): Promise<Browser> {
  const userDataDir = mkdtempSync(join(tmpdir(), 'shoalbook-e2e-'));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_ARGS,
    viewport,
    baseURL,
  });
  context.setDefaultTimeout(15_000);
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(userDataDir, { recursive: true, force: true });
    },
  };
}

/** Sign in through the form and wait until the app has moved on from /sign-in. */
export async function signIn(page: Page, email: string, password: string): Promise<void> {
  // Start from no session, so one failed test cannot leave the next one signed in as someone else.
  await page.context().clearCookies();
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => url.pathname !== '/sign-in');
}

/** Sign out through the account menu. */
export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^Account menu/ }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.waitForURL((url) => url.pathname === '/sign-in');
}

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

/** Where axe looks (CSS selectors; the whole page by default) and rules it runs beyond its defaults. */
export interface AxeScope {
  include?: string[];
  /** Rule ids to turn on, e.g. 'color-contrast-enhanced' (7:1, WCAG 2.2 SC 1.4.6, off in axe by default). */
  enable?: string[];
}

/**
 * Run axe-core on the page as it is now; returns the serious and critical violations in a readable form.
 * The script is evaluated through the DevTools protocol, so the app's strict CSP stays on.
 */
export async function seriousAxeViolations(page: Page, scope: AxeScope = {}): Promise<string[]> {
  // Colours are judged at rest: a dialog fading in would otherwise read as low contrast.
  // Only finite animations end; a spinner's never does, and the wait is capped either way.
  await page.evaluate(() => {
    const finite = document.getAnimations().filter((a) => a.effect?.getComputedTiming().iterations !== Infinity);
    const settled = Promise.all(finite.map((a) => a.finished.catch(() => undefined)));
    return Promise.race([settled, new Promise((resolve) => setTimeout(resolve, 2000))]);
  });
  await page.evaluate(AXE_SOURCE);
  const violations = (await page.evaluate(async ({ include, enable }) => {
    const axe = (
      window as unknown as {
        axe: { run: (ctx: Document | { include: string[] }, opts: object) => Promise<{ violations: unknown[] }> };
      }
    ).axe;
    const rules = Object.fromEntries((enable ?? []).map((id) => [id, { enabled: true }]));
    const result = await axe.run(include ? { include } : document, { resultTypes: ['violations'], rules });
    return result.violations;
  }, scope)) as AxeViolation[];
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.impact}: ${v.id} (${v.help}) at ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

/** Save a full-page screenshot under e2e/screenshots/ (git-ignored). */
export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOTS, { recursive: true });
  await page.screenshot({ path: join(SCREENSHOTS, `${name}.png`), fullPage: true });
}

/** The JSON API through the browser's own session (cookie and CSRF token), for setting the scene and checking it. */
export async function apiCall<T>(
  page: Page,
  method: 'GET' | 'POST' | 'PATCH',
  path: string,
  data?: unknown,
): Promise<T> {
  const csrf = (await (await page.request.get('/api/auth/csrf')).json()) as { csrfToken: string };
  const response = await page.request.fetch(`/api${path}`, {
    method,
    data,
    headers: { [CSRF_HEADER]: csrf.csrfToken },
  });
  if (!response.ok()) throw new Error(`${method} ${path} → ${response.status()}: ${await response.text()}`);
  return (await response.json()) as T;
}
