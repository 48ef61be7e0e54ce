import { fireEvent, screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meAs } from '../test/fixtures';
import { mockFetch } from '../test/mockFetch';
import { renderApp } from '../test/renderApp';

async function openSignIn(path = '/signin') {
  const app = renderApp(path);
  await screen.findByRole('heading', { name: 'Sign in' });
  return app;
}

function submit() {
  fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('SignInPage', () => {
  it('names each empty field and sends nothing', async () => {
    const server = mockFetch({});
    await openSignIn();
    submit();

    expect(await screen.findByText('E-mail is required.')).toBeTruthy();
    expect(screen.getByText('Password is required.')).toBeTruthy();
    expect(screen.getByLabelText('E-mail').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByLabelText('Password').getAttribute('aria-invalid')).toBe('true');
    expect(server.to('POST', '/api/auth/signin')).toHaveLength(0);
  });

  it('rejects a malformed address and a short password with messages naming the field', async () => {
    const server = mockFetch({});
    await openSignIn();
    fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: 'alice.hoist-works' } });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'short' } });
    submit();

    expect(
      await screen.findByText('E-mail must be an address like name@example.com.'),
    ).toBeTruthy();
    expect(screen.getByText('Password must be at least 10 characters (it has 5).')).toBeTruthy();
    // The first field at fault takes the focus, so keyboard users land on it.
    expect(document.activeElement).toBe(screen.getByLabelText('E-mail'));
    // The message is tied to the input for screen readers.
    const describedBy = screen.getByLabelText('Password').getAttribute('aria-describedby') ?? '';
    expect(document.getElementById(describedBy.split(' ')[0] ?? '')?.textContent).toContain(
      'Password must be',
    );
    expect(server.to('POST', '/api/auth/signin')).toHaveLength(0);
  });

  it('shows the server refusal above the form', async () => {
    mockFetch({
      'GET /api/auth/csrf': { body: { token: 't' } },
      'POST /api/auth/signin': {
        status: 401,
        body: { error: { code: 'not-signed-in', message: 'e-mail or password is wrong' } },
      },
    });
    await openSignIn();
    fireEvent.change(screen.getByLabelText('E-mail'), {
      target: { value: 'alice@hoist-works.test' },
    });
    fireEvent.change(screen.getByLabelText('Password'), { target: { value: 'not-the-password' } });
    submit();

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Sign-in failed');
    expect(alert.textContent).toContain('e-mail or password is wrong');
    expect(screen.getByRole('heading', { name: 'Sign in' })).toBeTruthy();
  });

  it('places a server field error under its field', async () => {
    mockFetch({
      'GET /api/auth/csrf': { body: { token: 't' } },
      'POST /api/auth/signin': {
        status: 400,
        body: {
          error: { code: 'invalid-field', message: 'email: must be at most 254 characters' },
        },
      },
    });
    await openSignIn();
    fireEvent.change(screen.getByLabelText('E-mail'), {
      target: { value: 'alice@hoist-works.test' },
    });
    fireEvent.change(screen.getByLabelText('Password'), {
      target: { value: 'correct horse battery' },
    });
    submit();

    expect(await screen.findByText('E-mail must be at most 254 characters')).toBeTruthy();
    expect(screen.getByLabelText('E-mail').getAttribute('aria-invalid')).toBe('true');
  });

  it('signs in with the CSRF token and returns to the page named in ?next', async () => {
    let signedIn = false;
    const server = mockFetch({
      'GET /api/auth/csrf': { body: { token: 'tok-9' } },
      'POST /api/auth/signin': () => {
        signedIn = true;
        return { body: { user: meAs('owner').user } };
      },
      'GET /api/auth/me': () =>
        signedIn
          ? { body: meAs('owner') }
          : { status: 401, body: { error: { code: 'not-signed-in', message: 'sign in first' } } },
      'GET /api/orgs/6f1c2a52-3d4e-4b7a-9c55-1f2e3d4c5b6a/projects': { body: { projects: [] } },
    });
    const { router } = await openSignIn('/signin?next=%2Fprojects');
    fireEvent.change(screen.getByLabelText('E-mail'), {
      target: { value: ' alice@hoist-works.test ' },
    });
    fireEvent.change(screen.getByLabelText('Password'), {
      target: { value: 'correct horse battery' },
    });
    submit();

    await screen.findByRole('heading', { name: 'Projects' });
    expect(router.state.location.pathname).toBe('/projects');
    const [request] = server.to('POST', '/api/auth/signin');
    expect(request?.body).toEqual({
      email: 'alice@hoist-works.test',
      password: 'correct horse battery',
    });
    expect(request?.headers['x-csrf-token']).toBe('tok-9');
  });

  it('links to GitHub sign-in, sign-up and password reset', async () => {
    mockFetch({});
    await openSignIn();
    expect(screen.getByRole('link', { name: /Sign in with GitHub/ }).getAttribute('href')).toBe(
      '/auth/github',
    );
    expect(screen.getByRole('link', { name: 'Create an account' }).getAttribute('href')).toBe(
      '/signup',
    );
    expect(screen.getByRole('link', { name: 'Forgot your password?' }).getAttribute('href')).toBe(
      '/reset',
    );
    await waitFor(() => expect(document.title).toBe('Sign in · Sheaf'));
  });
});
