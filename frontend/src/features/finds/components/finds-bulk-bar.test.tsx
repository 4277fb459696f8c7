import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { fakeNetwork } from '../../../testing/fake-network';
import { renderWithApp } from '../../../testing/render';
import { FindsBulkBar } from './finds-bulk-bar';

// jsdom has no document.adoptedStyleSheets; Primer's dialog needs the empty list browsers start with.
beforeAll(() => {
  if (!Array.isArray((document as { adoptedStyleSheets?: unknown }).adoptedStyleSheets)) {
    Object.defineProperty(document, 'adoptedStyleSheets', { configurable: true, writable: true, value: [] });
  }
});

const csrf = { status: 200, body: { csrfToken: 'tok' } };
const events = [{ id: 'e1', name: 'Spring Open' }];

describe('FindsBulkBar', () => {
  it('sets the kind and sub-kind of every chosen find in one request', async () => {
    const user = userEvent.setup();
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/finds/bulk-update': { status: 200, body: { updated: 3 } },
    }).install();
    const onDone = vi.fn();
    renderWithApp(<FindsBulkBar crewId="c1" findIds={['a', 'b', 'c']} events={events} onDone={onDone} />);
    expect(screen.getByText('3 finds chosen')).toBeInTheDocument();
    await user.selectOptions(screen.getByRole('combobox', { name: 'Kind' }), 'vegetation');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Sub-kind' }), 'hydrilla');
    await user.click(screen.getByRole('button', { name: 'Set kind' }));
    await screen.findByText('3 finds are now vegetation.');
    expect(net.to('POST /api/crews/c1/finds/bulk-update').map((r) => r.body)).toEqual([
      { findIds: ['a', 'b', 'c'], kind: 'vegetation', subKind: 'hydrilla' },
    ]);
    expect(onDone).toHaveBeenCalledOnce();
  });

  it('moves the chosen finds to no event', async () => {
    const user = userEvent.setup();
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/finds/bulk-update': { status: 200, body: { updated: 2 } },
    }).install();
    renderWithApp(<FindsBulkBar crewId="c1" findIds={['a', 'b']} events={events} onDone={() => {}} />);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Event' }), 'No event');
    await user.click(screen.getByRole('button', { name: 'Set event' }));
    await screen.findByText('2 finds belong to no event now.');
    expect(net.to('POST /api/crews/c1/finds/bulk-update')[0]!.body).toEqual({ findIds: ['a', 'b'], eventId: null });
  });

  it('deletes only after asking, says what stays, and shows a refusal without clearing the choice', async () => {
    const user = userEvent.setup();
    const net = fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'POST /api/crews/c1/finds/bulk-delete': [
        {
          status: 400,
          body: {
            statusCode: 400,
            code: 'validation_failed',
            message: '1 of the 2 finds are not in this crew (deleted meanwhile?); nothing was changed.',
            fieldErrors: {
              findIds: ['1 of the 2 finds are not in this crew (deleted meanwhile?); nothing was changed.'],
            },
          },
        },
        { status: 200, body: { deleted: 2, catchesUnattached: 1, stopsUnattached: 0 } },
      ],
    }).install();
    const onDone = vi.fn();
    renderWithApp(<FindsBulkBar crewId="c1" findIds={['a', 'b']} events={events} onDone={onDone} />);
    await user.click(screen.getByRole('button', { name: 'Delete 2 finds' }));
    const dialog = await screen.findByRole('alertdialog');
    expect(dialog).toHaveTextContent('Catches and stops at these finds stay in the journal');
    expect(net.to('POST /api/crews/c1/finds/bulk-delete')).toHaveLength(0);
    await user.click(screen.getAllByRole('button', { name: 'Delete 2 finds' }).at(-1)!);
    await screen.findByText('Nothing was changed');
    expect(onDone).not.toHaveBeenCalled();

    await user.click(screen.getAllByRole('button', { name: 'Delete 2 finds' }).at(-1)!);
    await screen.findByText('2 finds deleted. 1 catch and 0 stops stay, with no find.');
    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    expect(onDone).toHaveBeenCalledOnce();
    expect(net.to('POST /api/crews/c1/finds/bulk-delete').map((r) => r.body)).toEqual([
      { findIds: ['a', 'b'] },
      { findIds: ['a', 'b'] },
    ]);
  });
});
