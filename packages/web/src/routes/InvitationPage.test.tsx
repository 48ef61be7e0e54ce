import { fireEvent, screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { InvitationPreview } from '../api/types';
import { meAs, OTHER_ORG_ID } from '../test/fixtures';
import { mockFetch } from '../test/mockFetch';
import { renderApp } from '../test/renderApp';

const preview: InvitationPreview = {
  organization: { id: OTHER_ORG_ID, name: 'Pad & Pile' },
  email: 'alice@hoist-works.test',
  role: 'checker',
  expired: false,
  accepted: false,
};
const signedOut = {
  status: 401,
  body: { error: { code: 'not-signed-in', message: 'sign in first' } },
};

describe('InvitationPage', () => {
  it('shows organization and role, and offers sign-in and sign-up that come back here', async () => {
    mockFetch({
      'GET /api/invitations/tok123': { body: { invitation: preview } },
      'GET /api/auth/me': signedOut,
    });
    const { router } = renderApp('/invite/tok123');

    expect(await screen.findByRole('heading', { name: 'Invitation to Pad & Pile' })).toBeTruthy();
    expect(screen.getByText('Checker')).toBeTruthy();
    const back = encodeURIComponent('/invite/tok123');
    const email = encodeURIComponent(preview.email);
    expect((await screen.findByRole('link', { name: 'Sign in' })).getAttribute('href')).toBe(
      `/signin?next=${back}&email=${email}`,
    );
    expect(screen.getByRole('link', { name: 'Create an account' }).getAttribute('href')).toBe(
      `/signup?next=${back}&email=${email}`,
    );
    // Signed out is an expected answer here, not a reason to leave the page.
    expect(router.state.location.pathname).toBe('/invite/tok123');
  });

  it('accepts for a signed-in user and makes the new organization the current one', async () => {
    let joined = false;
    const server = mockFetch({
      'GET /api/invitations/tok123': { body: { invitation: preview } },
      'GET /api/auth/me': () => ({
        body: joined ? meAs('owner') : { ...meAs('owner'), memberships: [] },
      }),
      'GET /api/auth/csrf': { body: { token: 't' } },
      'POST /api/invitations/tok123/accept': () => {
        joined = true;
        return {
          body: {
            organization: { id: OTHER_ORG_ID, name: 'Pad & Pile', slug: 'pad-and-pile' },
            role: 'checker',
          },
        };
      },
      [`GET /api/orgs/${OTHER_ORG_ID}/sheets`]: { body: { sheets: [] } },
    });
    const { router } = renderApp('/invite/tok123');
    fireEvent.click(await screen.findByRole('button', { name: 'Join Pad & Pile' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/sheets'));
    expect(window.localStorage.getItem('sheaf.organizationId')).toBe(OTHER_ORG_ID);
    expect(await screen.findByText('Calculation sheets of Pad & Pile')).toBeTruthy();
    expect(server.to('POST', '/api/invitations/tok123/accept')).toHaveLength(1);
  });

  it('says when the invitation has expired and offers no way to accept it', async () => {
    mockFetch({
      'GET /api/invitations/old': { body: { invitation: { ...preview, expired: true } } },
      'GET /api/auth/me': { body: meAs('viewer') },
    });
    renderApp('/invite/old');
    expect(await screen.findByText('This invitation has expired')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Join/ })).toBeNull();
  });
});
