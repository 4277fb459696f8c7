// The account-enumeration rows of `npm run bench`: pairs of sign-up, password-reset and sign-in requests whose
// times must not tell an existing account from a missing or disabled one (OWASP ASVS 4.0.3 2.2.x and the OWASP
// Authentication cheat sheet, "account enumeration" by time). Their answers are compared request by request in
// backend/test/account-enumeration.e2e-spec.ts; the times are a speed figure, so they are measured here.
import { setTimeout } from 'node:timers/promises';
import { mark, median, msSince } from './timing.mjs';

const TRIES = 20;
/**
 * A pause after each request, so the work a request leaves for after its answer (a reset link, a welcome or
 * account-exists mail) has ended before the other side is timed: the answers are compared, not the background.
 */
const SETTLE_MS = 300;
const PASSWORD = 'a bench pass phrase for timing';

/** A fresh anonymous browser: its CSRF cookie and token, then one timed POST. */
async function timedPost(base, path, body) {
  const csrf = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = await csrf.json();
  const cookie = csrf.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const init = {
    method: 'POST',
    headers: { cookie, 'x-csrf-token': csrfToken, 'content-type': 'application/json' },
    body: JSON.stringify(body),
  };
  const t = mark();
  const res = await fetch(base + path, init);
  await res.text();
  return { ms: msSince(t), status: res.status };
}

/** `TRIES` interleaved requests of each side; the median times and the statuses each side answered. */
async function pair(base, path, a, b) {
  const times = { a: [], b: [] };
  const statuses = new Set();
  for (let i = 0; i < TRIES; i++) {
    for (const [side, body] of [
      ['a', a(i)],
      ['b', b(i)],
    ]) {
      const r = await timedPost(base, path, body);
      times[side].push(r.ms);
      statuses.add(r.status);
      await setTimeout(SETTLE_MS);
    }
  }
  return { a: median(times.a), b: median(times.b), statuses: [...statuses] };
}

/**
 * The three pairs on the bench server (its auth throttle raised, or the tries would be refused). `disable(email)`
 * marks an account disabled in the database, as a site admin would.
 */
export async function enumerationTimes(base, disable) {
  const stamp = Date.now().toString(36);
  const email = (who, i = '') => `bench-${who}${i}-${stamp}@example.test`;
  for (const who of ['taken', 'reset', 'disabled', 'active'])
    await timedPost(base, '/api/auth/sign-up', { email: email(who), password: PASSWORD, displayName: 'Bench' });
  await disable(email('disabled'));
  const signUp = (who) => (i) => ({ email: email(who, who === 'free' ? i : ''), password: PASSWORD, displayName: 'B' });
  return {
    signUp: await pair(base, '/api/auth/sign-up', signUp('free'), signUp('taken')),
    reset: await pair(
      base,
      '/api/auth/password-reset/request',
      // One address on each side, asked for again on every try, so the two differ only in having an account
      // (a fresh address each try would also be a first sight for the per-address throttle).
      () => ({ email: email('reset') }),
      () => ({ email: email('nobody') }),
    ),
    signIn: await pair(
      base,
      '/api/auth/sign-in',
      () => ({ email: email('disabled'), password: PASSWORD }),
      () => ({ email: email('active'), password: 'not the right pass phrase' }),
    ),
  };
}

const ms = (x) => `${x.toFixed(1)} ms`;

/** The report's rows: measure, one side, the other side, their ratio (larger over smaller), target. */
export function enumerationRows(t) {
  const row = (measure, times, [nameA, nameB]) => [
    measure,
    `${nameA}: median ${ms(times.a)} (n=${TRIES})`,
    `${nameB}: median ${ms(times.b)}; answers ${times.statuses.join(', ')}`,
    `${(Math.max(times.a, times.b) / Math.min(times.a, times.b)).toFixed(2)}× apart`,
    '≤ 1.2×, one status',
  ];
  return [
    row('sign-up: free vs taken address', t.signUp, ['free', 'taken']),
    row('reset request: account vs none', t.reset, ['account', 'no account']),
    row('sign-in: disabled vs wrong password', t.signIn, ['disabled', 'wrong password']),
  ];
}
