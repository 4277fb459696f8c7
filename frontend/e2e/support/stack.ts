import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { profile } from '../../../scripts/lib/profile.mjs';

const testProfile = profile('test');

/** Where the back end started by global-setup.ts serves the built app. */
export const BASE_URL = `http://127.0.0.1:${testProfile.port}`;

/** The password of every seeded demo account. */
export const DEMO_PASSWORD = 'shoalbook-demo';

/** The seeded demo crew (owner, angler and viewer belong to it; rival owns another). */
export const DEMO_CREW = 'Bluegill Flats Crew';
export const RIVAL_CREW = 'Redear Point Crew';

/** One message as scripts/fake-smtp.mjs stores it. */
export interface StoredMail {
  id: string;
  receivedAt: string;
  envelopeTo: string[];
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string;
}

function readOutbox(): StoredMail[] {
  const dir = testProfile.outboxDir;
  return readdirSync(dir)
    .filter((f) => f.endsWith('.json'))
    .map((f) => JSON.parse(readFileSync(join(dir, f), 'utf8')) as StoredMail);
}

/** Wait for the newest mail to `address` whose subject matches; mail is sent after the API answers. */
export async function waitForMail(address: string, subject: RegExp, timeoutMs = 15_000): Promise<StoredMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = readOutbox()
      .filter(
        (m) => m.envelopeTo.map((a) => a.toLowerCase()).includes(address.toLowerCase()) && subject.test(m.subject),
      )
      .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt))[0];
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${address} matching ${subject} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

/** The first link in a mail's text part that leads to `pathname` of the app. */
export function linkIn(mail: StoredMail, pathname: string): string {
  const links = mail.text.match(/https?:\/\/[^\s<>"']+/g) ?? [];
  const link = links.map((l) => l.replace(/[.,;:!?)\]]+$/, '')).find((l) => new URL(l).pathname === pathname);
  if (!link) throw new Error(`no ${pathname} link in the mail "${mail.subject}": ${mail.text}`);
  return link;
}

/** A unique address per run, so reruns never collide with accounts from an earlier run. */
export function freshEmail(label: string): string {
  return `${label}-${Date.now()}-${Math.floor(Math.random() * 1e6)}@example.test`;
}
