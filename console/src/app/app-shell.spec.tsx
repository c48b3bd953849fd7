import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { installFakeApi, json, problem } from '@/testing/fake-api';
import { demoSession, demoTeam, demoTeamId, otherTeamId } from '@/testing/demo-fixtures';
import { renderApp } from '@/testing/render-app';
import type { TeamRole } from '@/lib/permissions';

function signedInAs(role: TeamRole, health = () => json(200, { status: 'ok', version: '0.1.0' })) {
  return installFakeApi({
    'GET /v1/session': () => json(200, demoSession(role)),
    'GET /v1/teams/:teamId': ({ params }) =>
      params.teamId === demoTeamId ? json(200, demoTeam(role)) : json(200, { ...demoTeam('admin'), id: otherTeamId, name: 'Quillfeather risk analytics (invented)', isDemo: false }),
    'GET /v1/health': health,
  });
}

beforeEach(() => {
  window.localStorage.clear();
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('console shell', () => {
  it('sends a visitor without a session to sign-in, remembering the page asked for', async () => {
    installFakeApi({ 'GET /v1/session': () => problem(401, 'unauthenticated', 'Sign in first.') });
    const { router } = renderApp(`/teams/${demoTeamId}/api-keys`);

    expect(await screen.findByLabelText('E-mail')).toBeDefined();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(new URLSearchParams(router.state.location.search).get('next')).toBe(`/teams/${demoTeamId}/api-keys`);
    expect(screen.queryByRole('navigation', { name: 'Main' })).toBeNull();
  });

  it('opens the first team of the session from the front door', async () => {
    signedInAs('owner');
    const { router } = renderApp('/');

    expect(await screen.findByRole('heading', { level: 1, name: 'Overview' })).toBeDefined();
    expect(router.state.location.pathname).toBe(`/teams/${demoTeamId}`);
    expect(window.localStorage.getItem('leastline.team')).toBe(demoTeamId);
  });

  it('reopens the team chosen last time', async () => {
    window.localStorage.setItem('leastline.team', otherTeamId);
    signedInAs('developer');
    const { router } = renderApp('/');

    await screen.findByRole('heading', { level: 1, name: 'Overview' });
    expect(router.state.location.pathname).toBe(`/teams/${otherTeamId}`);
  });

  it.each([
    ['owner', ['Overview', 'Playground', 'Datasets', 'API keys', 'Team', 'Usage', 'Billing']],
    ['admin', ['Overview', 'API keys', 'Team', 'Usage']],
    ['developer', ['Overview', 'Playground', 'Datasets', 'API keys', 'Team']],
    ['billing', ['Overview', 'Team', 'Usage', 'Billing']],
  ] as const)('shows a %s only the sections the role may use', async (role, expected) => {
    signedInAs(role);
    renderApp(`/teams/${demoTeamId}`);

    const nav = await screen.findByRole('navigation', { name: 'Main' });
    const links = within(nav).getAllByRole('link');
    expect(links.map((link) => link.querySelector('.ll-nav-label')?.textContent)).toEqual(expected);
    expect(links[0]?.getAttribute('href')).toBe(`/teams/${demoTeamId}`);
    if (expected.includes('Billing' as never)) {
      expect(within(nav).getByRole('link', { name: 'Billing, coming soon' }).getAttribute('href')).toBe(`/teams/${demoTeamId}/billing`);
    }
  });

  it('lists every team of the account in the team switcher and opens the one chosen', async () => {
    signedInAs('owner');
    const { router } = renderApp(`/teams/${demoTeamId}`);

    const trigger = await screen.findByRole('button', { name: /^Team: Quillfeather Payments/ });
    fireEvent.pointerDown(trigger, { button: 0, ctrlKey: false, pointerType: 'mouse' });
    const menu = await screen.findByRole('menu');
    const items = within(menu).getAllByRole('menuitem');
    expect(items.map((item) => item.textContent)).toEqual([
      'Quillfeather Payments (invented demo team)Owner',
      'Quillfeather risk analytics (invented)Admin',
    ]);
    fireEvent.click(items[1] as HTMLElement);
    await waitFor(() => expect(router.state.location.pathname).toBe(`/teams/${otherTeamId}`));
  });

  it('shows a not-found page for a team the account does not belong to', async () => {
    signedInAs('owner');
    renderApp('/teams/00000000-0000-4000-8000-000000000000/team');

    expect(await screen.findByRole('heading', { level: 1, name: 'There is no page at this address' })).toBeDefined();
  });

  it('reports the API as unreachable when the health check answers 503', async () => {
    signedInAs('owner', () => problem(503, 'unavailable', 'down'));
    renderApp(`/teams/${demoTeamId}`);

    expect(await screen.findByText('API unreachable')).toBeDefined();
  });

  it('offers a skip link and remembers the chosen theme', async () => {
    signedInAs('owner');
    renderApp(`/teams/${demoTeamId}`);
    await screen.findByRole('navigation', { name: 'Main' });

    expect(screen.getByRole('link', { name: 'Skip to content' }).getAttribute('href')).toBe('#main-content');
    fireEvent.click(screen.getByRole('button', { name: 'Switch to dark theme' }));
    expect(window.localStorage.getItem('leastline.appearance')).toBe('dark');
    expect(document.documentElement.classList.contains('dark')).toBe(true);
  });
});
