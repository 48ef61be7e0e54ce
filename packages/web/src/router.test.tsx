import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { createAppQueryClient } from './api/queryClient';
import { CAUTION_TEXT } from './components/CautionFooter';
import { createRoutes } from './router';
import { meAs, sheets } from './test/fixtures';
import { mockFetch } from './test/mockFetch';
import { renderApp } from './test/renderApp';

const signedOut = {
  status: 401,
  body: { error: { code: 'not-signed-in', message: 'sign in first' } },
};

describe('router', () => {
  it('ends in a catch-all route, so no address falls through', () => {
    const [root] = createRoutes(createAppQueryClient());
    const last = root?.children?.at(-1);
    expect(last?.path).toBe('*');
    expect(typeof last?.lazy).toBe('function');
  });

  it('shows the not-found page, with the caution footer, for an unknown address', async () => {
    const server = mockFetch({});
    renderApp('/no/such/page');
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeTruthy();
    expect(screen.getByText('/no/such/page')).toBeTruthy();
    expect(screen.getByRole('contentinfo').textContent).toContain(CAUTION_TEXT);
    // The not-found page is public: it does not ask who is signed in.
    expect(server.sent).toHaveLength(0);
  });

  it('sends a signed-out visitor to sign in, remembering the page they wanted', async () => {
    mockFetch({ 'GET /api/auth/me': signedOut });
    const { router } = renderApp('/projects?x=1');
    await screen.findByRole('heading', { name: 'Sign in' });
    expect(router.state.location.pathname).toBe('/signin');
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/projects?x=1')}`);
  });

  it('opens the sheets list at the root address once signed in', async () => {
    mockFetch({
      'GET /api/auth/me': { body: meAs('checker') },
      'GET /api/orgs/6f1c2a52-3d4e-4b7a-9c55-1f2e3d4c5b6a/sheets': { body: { sheets } },
    });
    const { router } = renderApp('/');
    await screen.findByRole('heading', { name: 'Sheets' });
    expect(router.state.location.pathname).toBe('/sheets');
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeTruthy();
    expect(screen.getByRole('banner').textContent).toContain('Sheaf');
  });

  it('shows an API error of a page in the error boundary, keeping the navigation', async () => {
    mockFetch({
      'GET /api/auth/me': { body: meAs('viewer') },
      'GET /api/sheets/missing': {
        status: 404,
        body: { error: { code: 'not-found', message: 'sheet not found' } },
      },
    });
    renderApp('/sheets/missing');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Not found');
    expect(alert.textContent).toContain('sheet not found');
    expect(alert.textContent).toContain('404 not-found');
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeTruthy();
  });

  it('says so when the server cannot be reached at all', async () => {
    mockFetch({
      'GET /api/auth/me': () => {
        throw new TypeError('Failed to fetch');
      },
    });
    renderApp('/sheets');
    // One retry for network failures comes first (about a second).
    await waitFor(
      () => expect(screen.getByRole('alert').textContent).toContain('could not be reached'),
      {
        timeout: 4000,
      },
    );
  });
});
