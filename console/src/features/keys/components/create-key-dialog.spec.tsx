import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { Theme } from '@radix-ui/themes';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { csrfHeaderName } from '@/lib/csrf-middleware';
import { installFakeApi, json, problem } from '@/testing/fake-api';
import { demoKey, demoTeamId } from '@/testing/demo-fixtures';
import { CreateKeyDialog, expiryFor } from '@/features/keys/components/create-key-dialog';

// An invented, non-working key in the documented shape.
const fullKey = 'llsq1_7k2m9x4r8t3v_q0wc7d2b3xa9n7wq5hc2szc1vm4yr8ajkt6pd0fe_9hz3k2mw';

function renderDialog() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={queryClient}>
      <Theme>
        <CreateKeyDialog teamId={demoTeamId} />
      </Theme>
    </QueryClientProvider>,
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('create key dialog', () => {
  it('shows the full key once, with a warning, and forgets it when closed', async () => {
    const api = installFakeApi({
      'GET /v1/session/csrf-token': () => json(200, { csrfToken: 'csrf-1' }),
      'POST /v1/teams/:teamId/api-keys': ({ body }) =>
        json(201, { apiKey: demoKey({ name: (body as { name: string }).name }), plaintextKey: fullKey }),
      'GET /v1/teams/:teamId/api-keys': () => json(200, { items: [] }),
      'GET /v1/teams/:teamId/audit-events': () => json(200, { items: [], nextCursor: null }),
    });
    renderDialog();

    fireEvent.click(screen.getByRole('button', { name: 'Create key' }));
    const dialog = await screen.findByRole('dialog');
    fireEvent.change(within(dialog).getByLabelText('Name'), { target: { value: 'ledger sync (invented)' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Create key' }));

    expect(await within(dialog).findByText(fullKey)).toBeDefined();
    expect(within(dialog).getByRole('note').textContent).toMatch(/shown only this once/);
    expect(within(dialog).getByRole('button', { name: 'Copy key' })).toBeDefined();

    const sent = api.calls.find((call) => call.method === 'POST');
    expect(sent?.body).toEqual({ name: 'ledger sync (invented)', scopes: ['fits:run'] });
    expect(sent?.headers.get(csrfHeaderName)).toBe('csrf-1');

    fireEvent.click(within(dialog).getByRole('button', { name: 'I have stored the key' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(document.body.textContent).not.toContain(fullKey);

    fireEvent.click(screen.getByRole('button', { name: 'Create key' }));
    const reopened = await screen.findByRole('dialog');
    expect(within(reopened).getByLabelText('Name')).toBeDefined();
    expect(reopened.textContent).not.toContain(fullKey);
  });

  it('puts the API’s field error beside the name and shows its detail', async () => {
    installFakeApi({
      'GET /v1/session/csrf-token': () => json(200, { csrfToken: 'csrf-1' }),
      'POST /v1/teams/:teamId/api-keys': () =>
        problem(400, 'invalid-request', 'name must be shorter than or equal to 100 characters', [
          { pointer: '#/name', detail: 'must be shorter than or equal to 100 characters' },
        ]),
    });
    renderDialog();

    fireEvent.click(screen.getByRole('button', { name: 'Create key' }));
    const dialog = await screen.findByRole('dialog');
    fireEvent.change(within(dialog).getByLabelText('Name'), { target: { value: 'x' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Create key' }));

    const nameInput = within(dialog).getByLabelText('Name');
    await waitFor(() => expect(nameInput.getAttribute('aria-invalid')).toBe('true'));
    const errorId = nameInput.getAttribute('aria-describedby')?.split(' ')[0] ?? '';
    expect(document.getElementById(errorId)?.textContent).toBe('must be shorter than or equal to 100 characters');
    expect(within(dialog).getByRole('alert').textContent).toContain('name must be shorter than or equal to 100 characters');
  });

  it('refuses to send a key without any scope', async () => {
    const api = installFakeApi({});
    renderDialog();

    fireEvent.click(screen.getByRole('button', { name: 'Create key' }));
    const dialog = await screen.findByRole('dialog');
    fireEvent.change(within(dialog).getByLabelText('Name'), { target: { value: 'nightly backfill (invented)' } });
    fireEvent.click(within(dialog).getByRole('checkbox', { checked: true }));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Create key' }));

    expect(await within(dialog).findByText('Choose at least one scope.')).toBeDefined();
    expect(api.calls).toHaveLength(0);
  });
});

describe('expiryFor', () => {
  const now = Date.UTC(2026, 0, 10, 12, 0, 0);

  it('sends no expiry for "No expiry" and adds whole days for the fixed choices', () => {
    expect(expiryFor('never', '', now)).toEqual({});
    expect(expiryFor('30', '', now)).toEqual({ expiresAt: '2026-02-09T12:00:00.000Z' });
  });

  it('rejects a missing or past date', () => {
    expect(expiryFor('date', '', now).error).toBe('Choose a date.');
    expect(expiryFor('date', '2025-12-31', now).error).toBe('Choose a date in the future.');
  });
});
