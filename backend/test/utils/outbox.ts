import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { OutboxMessage } from '@shoalbook/shared';

interface StoredMessage extends OutboxMessage {
  envelopeTo: string[];
}

function outboxDir(): string {
  const dir = process.env.MAIL_OUTBOX_DIR;
  if (!dir) throw new Error('MAIL_OUTBOX_DIR is not set (the vitest config sets it from the test profile)');
  return dir;
}

/** Every message the fake SMTP server has stored, oldest first. */
export function readOutbox(): StoredMessage[] {
  const dir = outboxDir();
  return readdirSync(dir)
    .filter((n) => n.endsWith('.json'))
    .map((n) => JSON.parse(readFileSync(join(dir, n), 'utf8')) as StoredMessage)
    .sort((a, b) => a.receivedAt.localeCompare(b.receivedAt));
}

/** Messages to `address`, optionally only those whose subject matches (a new account's welcome comes first). */
export function messagesTo(address: string, subject?: RegExp): StoredMessage[] {
  return readOutbox().filter((m) => m.envelopeTo.includes(address) && (!subject || subject.test(m.subject)));
}

/** Wait for the `count`-th message to `address` (some mails are sent in the background). */
export async function waitForMail(
  address: string,
  count = 1,
  subject?: RegExp,
  timeoutMs = 10_000,
): Promise<StoredMessage> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const found = messagesTo(address, subject);
    if (found.length >= count) return found[count - 1]!;
    if (Date.now() > end) throw new Error(`no e-mail #${count} to ${address} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

/** The `token` query parameter of the first link in a message's text. */
export function tokenFromMail(message: OutboxMessage, path: '/invite' | '/reset-password'): string {
  const match = new RegExp(`${path}\\?token=([A-Za-z0-9_%-]+)`).exec(message.text);
  if (!match) throw new Error(`no ${path} link in the e-mail "${message.subject}"`);
  return decodeURIComponent(match[1]!);
}
