import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { installFakeApi, json, noContent } from '@/testing/fake-api';
import { demoSession, demoTeam, demoTeamId } from '@/testing/demo-fixtures';
import { renderApp } from '@/testing/render-app';
import type { TeamRole } from '@/lib/permissions';

// An invented dataset: settlement delays of a fictional processor's merchants.
const datasetId = '5e1f0a2b-3c4d-4e5f-8a6b-7c8d9e0f1a2b';
const stored = {
  id: datasetId,
  name: 'quayside-settlements',
  version: 2,
  contentHash: 'c0'.repeat(32),
  rowCount: 3,
  byteSize: 48,
  source: 'csv',
  createdBy: 'Dana Devlin (invented)',
  createdAt: '2026-05-01T09:00:00.000Z',
  columns: [
    { name: 'delay_days', kind: 'numeric', count: 3, missing: 0, mean: 2.5, standardDeviation: 0.5, min: 2, max: 3 },
    { name: 'ticket_eur', kind: 'numeric', count: 2, missing: 1, mean: 41.25, standardDeviation: 12.5, min: 32.41, max: 50.09 },
  ],
};

function fakeDatasetsApi(role: TeamRole) {
  return installFakeApi({
    'GET /v1/session': () => json(200, demoSession(role)),
    'GET /v1/teams/:teamId': () => json(200, demoTeam(role)),
    'GET /v1/health': () => json(200, { status: 'ok', version: '0.1.0' }),
    'GET /v1/datasets': () => json(200, { items: [stored, { ...stored, id: '6e1f0a2b-3c4d-4e5f-8a6b-7c8d9e0f1a2b', version: 1 }], nextCursor: null }),
    'GET /v1/datasets/:datasetId': () => json(200, stored),
    'GET /v1/datasets/:datasetId/rows': () =>
      json(200, { datasetId, columns: ['delay_days', 'ticket_eur'], offset: 0, limit: 25, total: 3, rows: [[2, 32.41], [3, null], [2.5, 50.09]] }),
    'GET /v1/session/csrf-token': () => json(200, { csrfToken: 'token-1' }),
    'DELETE /v1/datasets/:datasetId': () => noContent(),
  });
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('datasets page', () => {
  it('lists versions under their name and shows the chosen version’s column summaries and rows', async () => {
    const { calls } = fakeDatasetsApi('developer');
    renderApp(`/teams/${demoTeamId}/datasets?dataset=${datasetId}`);

    const list = await screen.findByRole('heading', { name: 'Stored datasets' });
    const group = list.closest('.ll-dataset-list') as HTMLElement;
    expect(within(group).getByRole('button', { name: 'quayside-settlements version 2' })).toBeDefined();
    expect(within(group).getByRole('button', { name: 'quayside-settlements version 1' })).toBeDefined();

    const summary = await screen.findByRole('table', { name: 'Column summaries' });
    const ticketRow = within(summary).getByText('ticket_eur').closest('tr') as HTMLElement;
    const cells = within(ticketRow).getAllByRole('cell').map((cell) => cell.textContent);
    expect(cells).toEqual(['numeric', '2', '1', '41.25', '12.5', '32.41', '50.09']);

    const rowsTable = await screen.findByRole('table', { name: 'Rows' });
    expect(within(rowsTable).getByText('missing')).toBeDefined();
    expect(screen.getByText('Rows 1–3 of 3')).toBeDefined();
    expect(calls.every((call) => !call.path.startsWith('/v1/datasets') || call.headers.get('x-leastline-team') === demoTeamId)).toBe(true);
  });

  it('deletes a version only after confirmation', async () => {
    const { calls } = fakeDatasetsApi('owner');
    const { router } = renderApp(`/teams/${demoTeamId}/datasets?dataset=${datasetId}`);

    fireEvent.click(await screen.findByRole('button', { name: 'Delete version' }));
    const dialog = await screen.findByRole('alertdialog');
    expect(calls.some((call) => call.method === 'DELETE')).toBe(false);
    fireEvent.click(within(dialog).getByRole('button', { name: 'Delete version' }));

    await vi.waitFor(() => expect(calls.some((call) => call.method === 'DELETE' && call.path === `/v1/datasets/${datasetId}`)).toBe(true));
    await vi.waitFor(() => expect(router.state.location.search).toBe(''));
  });

  it('opens the playground with a fit on the first two numeric columns', async () => {
    fakeDatasetsApi('developer');
    const { router } = renderApp(`/teams/${demoTeamId}/datasets?dataset=${datasetId}`);
    fireEvent.click(await screen.findByRole('button', { name: 'Open in playground' }));
    await vi.waitFor(() => expect(router.state.location.pathname).toBe(`/teams/${demoTeamId}/playground`));
  });
});
