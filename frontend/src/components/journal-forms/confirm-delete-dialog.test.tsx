import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { api } from '../../lib/api-client';
import { fakeNetwork } from '../../testing/fake-network';
import { renderWithApp } from '../../testing/render';
import { DeleteRecordButton } from './confirm-delete-dialog';

// jsdom has no document.adoptedStyleSheets; Primer's popover polyfill (the dialog's close-button tooltip)
// spreads it, so give the document the empty list browsers start with.
beforeAll(() => {
  if (!Array.isArray((document as { adoptedStyleSheets?: unknown }).adoptedStyleSheets)) {
    Object.defineProperty(document, 'adoptedStyleSheets', { configurable: true, writable: true, value: [] });
  }
});

const csrf = { status: 200, body: { csrfToken: 'tok' } };

function renderButton(onDeleted = vi.fn()) {
  renderWithApp(
    <DeleteRecordButton
      record="the lake “Heron Bend”"
      consequence="A lake that still has events or finds is kept."
      onDelete={() => api.delete('/crews/c1/lakes/l1')}
      onDeleted={onDeleted}
    />,
  );
  return onDeleted;
}

describe('DeleteRecordButton', () => {
  it('asks first, naming the record, and deletes only on confirmation', async () => {
    const net = fakeNetwork({ 'GET /api/auth/csrf': csrf, 'DELETE /api/crews/c1/lakes/l1': { status: 204 } }).install();
    const user = userEvent.setup();
    const onDeleted = renderButton();

    await user.click(screen.getByRole('button', { name: 'Delete' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Delete the lake “Heron Bend”?' });
    expect(dialog).toHaveTextContent('This cannot be undone.');
    await user.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument();
    expect(net.to('DELETE /api/crews/c1/lakes/l1')).toHaveLength(0);

    await user.click(screen.getByRole('button', { name: 'Delete' }));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Delete' }));
    await waitFor(() => expect(onDeleted).toHaveBeenCalledOnce());
    expect(net.to('DELETE /api/crews/c1/lakes/l1')).toHaveLength(1);
    expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument();
  });

  it('keeps the dialog open with the server’s sentence when the record is still in use (409 in_use)', async () => {
    fakeNetwork({
      'GET /api/auth/csrf': csrf,
      'DELETE /api/crews/c1/lakes/l1': {
        status: 409,
        body: {
          statusCode: 409,
          error: 'Conflict',
          code: 'in_use',
          message: 'The lake still has 2 event(s) and 3 find(s); delete those first.',
        },
      },
    }).install();
    const user = userEvent.setup();
    const onDeleted = renderButton();

    await user.click(screen.getByRole('button', { name: 'Delete' }));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Delete' }));

    const dialog = await screen.findByRole('alertdialog');
    await waitFor(() =>
      expect(dialog).toHaveTextContent('The lake still has 2 event(s) and 3 find(s); delete those first.'),
    );
    expect(dialog).toHaveTextContent('Not deleted: other records still use it');
    // Trying again cannot help until the other records are gone: only closing is offered.
    expect(within(dialog).queryByRole('button', { name: 'Delete' })).not.toBeInTheDocument();
    await user.click(within(dialog).getAllByRole('button', { name: 'Close' }).at(-1)!);
    expect(onDeleted).not.toHaveBeenCalled();
  });
});
