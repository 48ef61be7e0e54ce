import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { MembersResponse } from '../api/types';
import { bruno, meAs, members, ORG_ID } from '../test/fixtures';
import { mockFetch, type Reply } from '../test/mockFetch';
import { renderApp } from '../test/renderApp';

const MEMBERS = `/api/orgs/${ORG_ID}/members`;
const roster: MembersResponse = {
  members,
  invitations: [
    {
      id: '33333333-3333-4333-8333-333333333333',
      email: 'chen@hoist-works.test',
      role: 'checker',
      createdAt: '2025-03-01T10:00:00.000Z',
      expiresAt: '2025-03-08T10:00:00.000Z',
    },
  ],
};

describe('MembersPage', () => {
  it.each(['engineer', 'checker', 'viewer'] as const)(
    'shows a %s the list but none of the owner controls',
    async (role) => {
      mockFetch({ 'GET /api/auth/me': { body: meAs(role) }, [`GET ${MEMBERS}`]: { body: roster } });
      renderApp('/members');

      const table = await screen.findByRole('table', { name: 'Members of Hoist Works' });
      expect(within(table).getByText('Bruno Keel')).toBeTruthy();
      expect(within(table).getByText('Engineer')).toBeTruthy();
      // The top bar's organization switcher is a combobox too; the page's own controls sit in main.
      const page = screen.getByRole('main');
      expect(within(page).queryAllByRole('combobox')).toHaveLength(0);
      expect(within(page).queryByRole('button', { name: /Remove/ })).toBeNull();
      expect(screen.queryByRole('form', { name: 'Invite someone' })).toBeNull();
      expect(screen.queryByText('chen@hoist-works.test')).toBeNull();
    },
  );

  it('gives an owner role pickers, remove buttons and the invitation form', async () => {
    mockFetch({
      'GET /api/auth/me': { body: meAs('owner') },
      [`GET ${MEMBERS}`]: { body: roster },
    });
    renderApp('/members');

    const picker = await screen.findByRole('combobox', { name: 'Role of Bruno Keel' });
    expect((picker as HTMLSelectElement).value).toBe('engineer');
    expect(screen.getByRole('button', { name: 'Remove Bruno Keel' })).toBeTruthy();
    expect(screen.getByRole('form', { name: 'Invite someone' })).toBeTruthy();
    expect(screen.getByText('chen@hoist-works.test')).toBeTruthy();
  });

  it('shows a role change at once and puts the old role back when the server refuses', async () => {
    let answer: (reply: Reply) => void = () => {};
    const server = mockFetch({
      'GET /api/auth/me': { body: meAs('owner') },
      [`GET ${MEMBERS}`]: { body: roster },
      'GET /api/auth/csrf': { body: { token: 't' } },
      [`PATCH ${MEMBERS}/${bruno.id}`]: () => new Promise<Reply>((resolve) => (answer = resolve)),
    });
    renderApp('/members');
    const picker = (await screen.findByRole('combobox', {
      name: 'Role of Bruno Keel',
    })) as HTMLSelectElement;

    fireEvent.change(picker, { target: { value: 'checker' } });
    // Optimistic: the new role shows while the request is still out.
    await waitFor(() => expect(server.to('PATCH', `${MEMBERS}/${bruno.id}`)).toHaveLength(1));
    expect(picker.value).toBe('checker');
    expect(server.to('PATCH', `${MEMBERS}/${bruno.id}`)[0]?.body).toEqual({ role: 'checker' });

    answer({
      status: 409,
      body: { error: { code: 'conflict', message: 'Bruno Keel is signing a revision' } },
    });
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The role was not changed');
    expect(alert.textContent).toContain('Bruno Keel is signing a revision');
    await waitFor(() => expect(picker.value).toBe('engineer'));
  });

  it('checks the invitation address before sending and names the field', async () => {
    const server = mockFetch({
      'GET /api/auth/me': { body: meAs('owner') },
      [`GET ${MEMBERS}`]: { body: roster },
    });
    renderApp('/members');
    const form = await screen.findByRole('form', { name: 'Invite someone' });
    fireEvent.change(within(form).getByLabelText('E-mail'), {
      target: { value: 'not-an-address' },
    });
    fireEvent.click(within(form).getByRole('button', { name: 'Send invitation' }));
    expect(
      await within(form).findByText('E-mail must be an address like name@example.com.'),
    ).toBeTruthy();
    expect(server.to('POST', `/api/orgs/${ORG_ID}/invitations`)).toHaveLength(0);
  });
});
