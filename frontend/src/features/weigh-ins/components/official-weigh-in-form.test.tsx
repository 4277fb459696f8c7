import type { UnitPreferences } from '@shoalbook/shared';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { fakeNetwork } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { OfficialWeighInForm } from './official-weigh-in-form';

const prefs: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };
const csrf = { status: 200, body: { csrfToken: 'tok' } };
const path = 'PUT /api/crews/c1/competition-days/d1/weigh-in';

function renderForm() {
  return renderWithApp(<OfficialWeighInForm crewId="c1" dayId="d1" official={null} prefs={prefs} />);
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

    expect(await screen.findByRole('status')).toHaveTextContent('Saved');
    expect(net.to(path)).toHaveLength(1);
    expect(net.to(path)[0]!.body).toMatchObject({ grossLb: 18.5, officialLb: 17.62, penaltyLb: null });
  });
});
