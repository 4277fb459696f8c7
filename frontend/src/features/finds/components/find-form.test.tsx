import type { UnitPreferences } from '@shoalbook/shared';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { validate as isUuid, version as uuidVersion } from 'uuid';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { sendQueue } from '../../../lib/send-queue';
import { testFind, testLake } from '../../../testing/journal-fixtures';
import { fakeNetwork, type SeenRequest } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { FindForm } from './find-form';

const prefs: UnitPreferences = { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' };
const csrf = { status: 200, body: { csrfToken: 'tok' } };

/** A network that is down until `online.now` is set; what reached the server is kept in `received`. */
function flakyServer(route: string, answer: (request: SeenRequest) => unknown) {
  const online = { now: false };
  const received: SeenRequest[] = [];
  fakeNetwork({
    'GET /api/auth/csrf': csrf,
    [route]: (request) => {
      if (!online.now) throw new TypeError('Failed to fetch');
      received.push(request);
      return { status: route.startsWith('POST') ? 201 : 200, body: answer(request) };
    },
  }).install();
  return { online, received };
}

describe('FindForm without signal', () => {
  afterEach(() => sendQueue.discardAll('u1'));

  it('keeps a new find on the phone with its own UUID v7, clears for the next one, and sends it once there is signal', async () => {
    const server = flakyServer('POST /api/crews/c1/finds', (r) =>
      testFind({ ...(r.body as object), id: 'x', name: 'x' }),
    );
    const onSaved = vi.fn();
    const user = userEvent.setup();
    renderWithApp(<FindForm userId="u1" crewId="c1" lakes={[testLake]} events={[]} prefs={prefs} onSaved={onSaved} />);

    await user.type(screen.getByRole('textbox', { name: /^Name/ }), 'Gravel hump');
    await user.type(screen.getByRole('textbox', { name: /^Latitude/ }), '34.5012');
    await user.type(screen.getByRole('textbox', { name: /^Longitude/ }), '-86.2034');
    await user.click(screen.getByRole('button', { name: 'Add find' }));

    expect(await screen.findByText('Waiting to send')).toBeInTheDocument();
    expect(screen.getByText(/Gravel hump is saved on this phone/)).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: /^Name/ })).toHaveValue('');
    expect(onSaved).not.toHaveBeenCalled();
    const [queued] = await sendQueue.entries('u1');
    expect(queued).toMatchObject({ kind: 'find', method: 'POST', scope: 'l1', label: 'New find Gravel hump' });
    const body = queued!.body as { id: string; name: string; lat: number };
    // RFC 9562 §5.7: the id is made on the phone, so the find has it before the server does.
    expect(isUuid(body.id) && uuidVersion(body.id)).toBe(7);
    expect(queued!.recordId).toBe(body.id);

    server.online.now = true;
    await sendQueue.drain('u1', { now: true });
    expect(await sendQueue.entries('u1')).toEqual([]);
    expect(server.received).toHaveLength(1);
    expect(server.received[0]!.body).toMatchObject({ id: body.id, name: 'Gravel hump', lat: 34.5012, lon: -86.2034 });
    expect(server.received[0]!.headers['idempotency-key']).toBe(`"${queued!.key}"`);
  });

  it('bases a second offline edit on the first: version 3 on the server, the waiting change makes it 4', async () => {
    const find = { ...testFind({ id: 'f1', name: 'Rock pile' }), version: 3 };
    const server = flakyServer('PATCH /api/crews/c1/finds/f1', () => find);
    const user = userEvent.setup();
    renderWithApp(
      <FindForm userId="u1" crewId="c1" lakes={[testLake]} events={[]} find={find} prefs={prefs} onSaved={vi.fn()} />,
    );

    const name = screen.getByRole('textbox', { name: /^Name/ });
    await user.clear(name);
    await user.type(name, 'Rock pile north');
    await user.click(screen.getByRole('button', { name: 'Save find' }));
    expect(await screen.findByText(/The changes are saved on this phone/)).toBeInTheDocument();
    await user.type(name, ' end');
    await user.click(screen.getByRole('button', { name: 'Save find' }));
    await waitFor(async () => expect(await sendQueue.entries('u1')).toHaveLength(2));

    const bodies = (await sendQueue.entries('u1')).map((e) => e.body as { name: string; version: number });
    expect(bodies.map((b) => [b.name, b.version])).toEqual([
      ['Rock pile north', 3],
      ['Rock pile north end', 4],
    ]);
    expect(bodies[0]).not.toHaveProperty('lakeId');
    server.online.now = true;
    await sendQueue.drain('u1', { now: true });
    expect(server.received.map((r) => (r.body as { version: number }).version)).toEqual([3, 4]);
  });
});
