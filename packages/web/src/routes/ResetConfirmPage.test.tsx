import { fireEvent, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { mockFetch } from '../test/mockFetch';
import { renderApp } from '../test/renderApp';

async function fill(password: string, repeat: string) {
  fireEvent.change(await screen.findByLabelText('New password'), { target: { value: password } });
  fireEvent.change(screen.getByLabelText('Repeat password'), { target: { value: repeat } });
  fireEvent.click(screen.getByRole('button', { name: 'Set new password' }));
}

describe('ResetConfirmPage', () => {
  it('checks length and repetition before sending', async () => {
    const server = mockFetch({});
    renderApp('/reset/tok-1');
    await fill('short', 'other');
    expect(
      await screen.findByText('New password must be at least 10 characters (it has 5).'),
    ).toBeTruthy();
    expect(screen.getByText('Repeat password must match the new password.')).toBeTruthy();
    expect(server.to('POST', '/api/auth/reset/confirm')).toHaveLength(0);
  });

  it('sends the token from the link with the new password, then offers sign-in', async () => {
    const server = mockFetch({
      'GET /api/auth/csrf': { body: { token: 't' } },
      'POST /api/auth/reset/confirm': { status: 204 },
    });
    renderApp('/reset/tok-1');
    await fill('a-long-enough-password', 'a-long-enough-password');
    expect(await screen.findByRole('heading', { name: 'Password changed' })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Sign in' }).getAttribute('href')).toBe('/signin');
    expect(server.to('POST', '/api/auth/reset/confirm')[0]?.body).toEqual({
      token: 'tok-1',
      password: 'a-long-enough-password',
    });
  });

  it('says an expired link has expired and links to a new request', async () => {
    mockFetch({
      'GET /api/auth/csrf': { body: { token: 't' } },
      'POST /api/auth/reset/confirm': {
        status: 410,
        body: { error: { code: 'expired', message: 'token: expired' } },
      },
    });
    renderApp('/reset/old');
    await fill('a-long-enough-password', 'a-long-enough-password');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('This reset link has expired');
    expect(screen.getByRole('link', { name: 'Request a new link' }).getAttribute('href')).toBe(
      '/reset',
    );
  });

  it('gives the server’s reason when the link is unknown or used', async () => {
    mockFetch({
      'GET /api/auth/csrf': { body: { token: 't' } },
      'POST /api/auth/reset/confirm': {
        status: 400,
        body: {
          error: { code: 'invalid-field', message: 'token: this reset link has already been used' },
        },
      },
    });
    renderApp('/reset/used');
    await fill('a-long-enough-password', 'a-long-enough-password');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('This reset link cannot be used');
    expect(alert.textContent).toContain('this reset link has already been used');
  });
});
