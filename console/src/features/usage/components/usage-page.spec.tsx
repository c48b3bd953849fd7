import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { installFakeApi, json } from '@/testing/fake-api';
import { demoSession, demoTeam, demoTeamId } from '@/testing/demo-fixtures';
import { renderApp } from '@/testing/render-app';
import type { TeamRole } from '@/lib/permissions';

// Invented metering of the demo team.
const report = {
  from: '2026-11-01',
  to: '2026-11-30',
  rows: [
    { day: '2026-11-02', apiKeyId: '9d8c7b6a-5f4e-4d3c-8b2a-190817263544', endpoint: 'fits', requests: 3, units: 4, observations: 1200 },
    { day: '2026-11-03', apiKeyId: null, endpoint: 'rolling-fits', requests: 1, units: 2, observations: 160 },
  ],
  totals: { requests: 4, units: 6, observations: 1360 },
  unitsRule: 'units = models + ceil(observations / 10000), at least 1 per call',
};
const overview = {
  plan: 'growth',
  periodStart: '2026-11-01',
  unitsThisPeriod: 6,
  includedUnits: 100000,
  requestsByDay: [{ day: '2026-11-02', requests: 5, errors: 1 }],
  errorRate: 0.2,
  recentRequests: [],
};

function fakeUsageApi(role: TeamRole) {
  return installFakeApi({
    'GET /v1/session': () => json(200, demoSession(role)),
    'GET /v1/teams/:teamId': () => json(200, demoTeam(role)),
    'GET /v1/health': () => json(200, { status: 'ok', version: '0.1.0' }),
    'GET /v1/usage': () => json(200, report),
    'GET /v1/usage/overview': () => json(200, overview),
  });
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('usage page', () => {
  it('shows totals, the allowance and tables by key and endpoint to billing members', async () => {
    const { calls } = fakeUsageApi('billing');
    renderApp(`/teams/${demoTeamId}/usage`);

    expect((await screen.findByTestId('usage-totals')).textContent).toBe('4 requests, 6 units, 1,360 observations');
    expect((await screen.findByTestId('units-this-period')).textContent).toContain('of 100,000 units');
    const byKey = screen.getByRole('table', { name: 'Usage by key' });
    expect(within(byKey).getByText('Console (no key)')).toBeDefined();
    const byEndpoint = screen.getByRole('table', { name: 'Usage by endpoint' });
    expect(within(byEndpoint).getAllByRole('rowheader').map((cell) => cell.textContent)).toEqual(['/v1/fits', '/v1/rolling-fits']);

    const query = calls.find((call) => call.path === '/v1/usage');
    expect(query?.headers.get('x-leastline-team')).toBe(demoTeamId);
  });

  it('exports the rows as a CSV file in the browser', async () => {
    fakeUsageApi('owner');
    const created: Blob[] = [];
    const original = { create: URL.createObjectURL, revoke: URL.revokeObjectURL };
    URL.createObjectURL = (blob: Blob) => {
      created.push(blob);
      return 'blob:usage';
    };
    URL.revokeObjectURL = () => undefined;
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => undefined);
    renderApp(`/teams/${demoTeamId}/usage`);

    await screen.findByTestId('usage-totals');
    try {
      fireEvent.click(screen.getByRole('button', { name: 'Export CSV' }));
    } finally {
      URL.createObjectURL = original.create;
      URL.revokeObjectURL = original.revoke;
    }
    expect(click).toHaveBeenCalledTimes(1);
    expect(created).toHaveLength(1);
    const text = await created[0]!.text();
    expect(text.split('\r\n')[0]).toBe('day,api_key_id,endpoint,requests,units,observations');
    expect(text).toContain('2026-11-03,,rolling-fits,1,2,160');
  });

  it('tells a developer that the role cannot see usage, without asking the API', async () => {
    const { calls } = fakeUsageApi('developer');
    renderApp(`/teams/${demoTeamId}/usage`);
    expect(await screen.findByRole('heading', { name: 'Your role cannot see usage' })).toBeDefined();
    expect(calls.some((call) => call.path.startsWith('/v1/usage'))).toBe(false);
  });
});
