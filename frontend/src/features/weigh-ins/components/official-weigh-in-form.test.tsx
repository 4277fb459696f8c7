import type { UnitPreferences } from '@shoalbook/shared';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { sendQueue } from '../../../lib/send-queue';
import { fakeNetwork } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { OfficialWeighInForm } from './official-weigh-in-form';

const prefs: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };
const csrf = { status: 200, body: { csrfToken: 'tok' } };
const path = 'PUT /api/crews/c1/competition-days/d1/weigh-in';

function renderForm() {
  return renderWithApp(
    <OfficialWeighInForm userId="u1" crewId="c1" dayId="d1" date="2026-06-13" official={null} prefs={prefs} />,
  );
}

describe('OfficialWeighInForm (numbers read by the locale)', () => {
  it("refuses the scale's 18,500 in en-US (the comma groups thousands) naming the field, and sends nothing", async () => {
    const net = fakeNetwork({ 'GET /api/auth/csrf': csrf, [path]: { status: 200, body: {} } }).install();
    const user = userEvent.setup();
    renderForm();

    await user.type(screen.getByRole('textbox', { name: 'Gross on the scale' }), '18,500');
    await user.type(screen.getByRole('textbox', { name: 'Official weight' }), '17.62');
    await user.click(screen.getByRole('button', { name: 'Save official figures' }));

    expect(navigator.language).toBe('en-US'); // jsdom's locale (CLDR en: comma = group sign)
    expect(screen.getByRole('textbox', { name: 'Gross on the scale' })).toHaveAccessibleDescription(
      expect.stringContaining("Gross on the scale: '18,500' is not a weight in pounds; write 18.5 or 18 lb 8 oz."),
    );
    expect(net.to(path)).toHaveLength(0);
  });

  it('sends the figures as typed, in pounds: 17.62 and 18 lb 8 oz (= 18.5 lb, 16 oz to the pound)', async () => {
    const net = fakeNetwork({ 'GET /api/auth/csrf': csrf, [path]: { status: 200, body: {} } }).install();
    const user = userEvent.setup();
    renderForm();

    await user.type(screen.getByRole('textbox', { name: 'Gross on the scale' }), '18 lb 8 oz');
    await user.type(screen.getByRole('textbox', { name: 'Official weight' }), '17.62');
    await user.click(screen.getByRole('button', { name: 'Save official figures' }));

    await waitFor(() => expect(screen.getByRole('status')).toHaveTextContent('Saved; the official figures now count.'));
    expect(net.to(path)).toHaveLength(1);
    expect(net.to(path)[0]!.body).toMatchObject({ grossLb: 18.5, officialLb: 17.62, penaltyLb: null });
  });
});

describe('OfficialWeighInForm without signal', () => {
  afterEach(() => sendQueue.discardAll('u1'));

  it('keeps the figures on the phone, bases a second save on the first, and sends both in order with their keys', async () => {
    let online = false;
    const received: { officialLb: number; key: string }[] = [];
    fakeNetwork({
      'GET /api/auth/csrf': csrf,
      [path]: (request) => {
        if (!online) throw new TypeError('Failed to fetch');
        received.push({
          officialLb: (request.body as { officialLb: number }).officialLb,
          key: request.headers['idempotency-key']!,
        });
        return { status: 200, body: {} };
      },
    }).install();
    const user = userEvent.setup();
    renderForm();

    await user.type(screen.getByRole('textbox', { name: 'Official weight' }), '17.62');
    await user.click(screen.getByRole('button', { name: 'Save official figures' }));
    expect(await screen.findByText('Waiting to send')).toBeInTheDocument();
    const [first] = await sendQueue.entries('u1');
    expect(first).toMatchObject({
      kind: 'weigh-in',
      method: 'PUT',
      scope: 'd1',
      label: expect.stringMatching(/^Official figures for Sat.* 13 Jun 2026$/),
    });
    expect(first!.body).not.toHaveProperty('version');

    // A correction while the first is still on the phone: once sent, the first creates version 1.
    await user.clear(screen.getByRole('textbox', { name: 'Official weight' }));
    await user.type(screen.getByRole('textbox', { name: 'Official weight' }), '17.26');
    await user.click(screen.getByRole('button', { name: 'Save official figures' }));
    await waitFor(async () => expect(await sendQueue.entries('u1')).toHaveLength(2));
    const [, second] = await sendQueue.entries('u1');
    expect(second!.body).toMatchObject({ officialLb: 17.26, version: 1 });

    online = true;
    await sendQueue.drain('u1', { now: true });
    expect(await sendQueue.entries('u1')).toEqual([]);
    expect(received.map((r) => r.officialLb)).toEqual([17.62, 17.26]);
    expect(received.map((r) => r.key)).toEqual([`"${first!.key}"`, `"${second!.key}"`]);
  });
});
