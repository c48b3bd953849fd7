import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { renderApp } from '@/testing/render-app';

const getRequest = vi.hoisted(() => vi.fn());
vi.mock('@/lib/api-client', () => ({ apiClient: { GET: getRequest } }));

function healthAnswers(status: number) {
  getRequest.mockResolvedValue({ response: new Response(null, { status }) });
}

beforeEach(() => {
  window.localStorage.clear();
});

afterEach(() => {
  cleanup();
  getRequest.mockReset();
});

describe('console shell', () => {
  it('lists every console section in the main navigation, in order, with its path', async () => {
    healthAnswers(200);
    renderApp('/');

    const nav = await screen.findByRole('navigation', { name: 'Main' });
    const expected = [
      ['Overview', '/'],
      ['Playground', '/playground'],
      ['Datasets', '/datasets'],
      ['API keys', '/api-keys'],
      ['Team', '/team'],
      ['Usage', '/usage'],
      ['Billing, coming soon', '/billing'],
    ] as const;
    const links = within(nav).getAllByRole('link');
    expect(links.map((link) => link.getAttribute('href'))).toEqual(expected.map(([, href]) => href));
    for (const [name, href] of expected) {
      expect(within(nav).getByRole('link', { name }).getAttribute('href')).toBe(href);
    }
    expect(await screen.findByRole('heading', { level: 1, name: 'Overview' })).toBeDefined();
  });

  it('opens each section page from the navigation, showing its empty state', async () => {
    healthAnswers(200);
    renderApp('/');
    const nav = await screen.findByRole('navigation', { name: 'Main' });

    // The playground is left out: it loads the code editor, which needs a real browser.
    const sections = [
      ['Datasets', 'Datasets', 'No datasets yet'],
      ['API keys', 'API keys', 'No API keys yet'],
      ['Team', 'Team', 'No members to show'],
      ['Usage', 'Usage', 'No usage recorded'],
      ['Billing, coming soon', 'Billing', 'Billing is on its way'],
      ['Overview', 'Overview', 'No activity yet'],
    ] as const;
    for (const [linkName, heading, emptyTitle] of sections) {
      fireEvent.click(within(nav).getByRole('link', { name: linkName }));
      expect(await screen.findByRole('heading', { level: 1, name: heading })).toBeDefined();
      expect(screen.getByRole('heading', { level: 2, name: emptyTitle })).toBeDefined();
      expect(document.title).toBe(`${heading} · Leastline`);
      expect(within(nav).getByRole('link', { name: linkName }).getAttribute('aria-current')).toBe('page');
    }
  });

  it('offers a skip link to the main content', async () => {
    healthAnswers(200);
    renderApp('/');
    await screen.findByRole('navigation', { name: 'Main' });

    const skip = screen.getByRole('link', { name: 'Skip to content' });
    expect(skip.getAttribute('href')).toBe('#main-content');
    expect(document.getElementById('main-content')?.tagName).toBe('MAIN');
  });

  it('reports the API as up when the health check answers with a 2xx status', async () => {
    healthAnswers(204);
    renderApp('/');

    expect(await screen.findByText('API up')).toBeDefined();
    expect(getRequest).toHaveBeenCalledWith('/v1/health', expect.anything());
  });

  it('reports the API as unreachable when the health check answers 503', async () => {
    healthAnswers(503);
    renderApp('/');

    expect(await screen.findByText('API unreachable')).toBeDefined();
  });

  it('reports the API as unreachable when the request cannot be sent', async () => {
    getRequest.mockRejectedValue(new TypeError('Failed to fetch'));
    renderApp('/');

    expect(await screen.findByText('API unreachable')).toBeDefined();
  });

  it('remembers the chosen theme', async () => {
    healthAnswers(200);
    renderApp('/');
    await screen.findByRole('navigation', { name: 'Main' });

    fireEvent.click(screen.getByRole('button', { name: 'Switch to dark theme' }));

    expect(window.localStorage.getItem('leastline.appearance')).toBe('dark');
    expect(document.documentElement.classList.contains('dark')).toBe(true);
    expect(screen.getByRole('button', { name: 'Switch to light theme' })).toBeDefined();
  });

  it('shows a not-found page inside the shell for unknown addresses', async () => {
    healthAnswers(200);
    renderApp('/no-such-page');

    expect(await screen.findByRole('heading', { level: 1, name: 'There is no page at this address' })).toBeDefined();
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeDefined();
  });

  it('serves a labelled sign-in form outside the shell', async () => {
    renderApp('/sign-in');

    expect(await screen.findByLabelText('E-mail')).toBeDefined();
    expect(screen.getByLabelText('Password')).toBeDefined();
    expect(screen.queryByRole('navigation', { name: 'Main' })).toBeNull();
  });
});
