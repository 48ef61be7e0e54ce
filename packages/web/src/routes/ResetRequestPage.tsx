import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { useRequestPasswordReset } from '../api/auth';
import { FormAlert, FormNotice } from '../components/FormAlert';
import { TextField } from '../components/TextField';
import { splitServerError } from '../forms/serverErrors';
import { checkEmail } from '../forms/validators';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/** Ask for a password-reset link by e-mail. The answer never says whether the address is known. */
export function ResetRequestPage() {
  useDocumentTitle('Reset your password');
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const [error, setError] = useState<string | undefined>();

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problem = checkEmail(email);
    setError(problem);
    if (problem) {
      (event.currentTarget.elements.namedItem('email') as HTMLInputElement | null)?.focus();
      return;
    }
    request.mutate({ email: email.trim() });
  }

  const server = splitServerError(request.error, { email: 'E-mail' });

  return (
    <>
      <h1 className="mb-1 text-[1.25rem]">Reset your password</h1>
      <p className="mb-5 text-ink-muted">We will e-mail you a link to choose a new one.</p>
      {request.isSuccess ? (
        <FormNotice>
          If an account uses <span className="font-mono">{email.trim()}</span>, a reset link is on
          its way. The link works for a limited time.
        </FormNotice>
      ) : null}
      {server.form ? (
        <FormAlert title="The reset link was not sent">{server.form}</FormAlert>
      ) : null}
      <form
        noValidate
        onSubmit={onSubmit}
        aria-label="Request a password reset"
        className="space-y-4"
      >
        <TextField
          label="E-mail"
          name="email"
          type="email"
          autoComplete="email"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={error ?? server.field.email}
          required
        />
        <button type="submit" className="btn btn-primary" disabled={request.isPending}>
          {request.isPending ? 'Sending…' : 'Send reset link'}
        </button>
      </form>
      <p className="mt-5 text-ink-muted">
        Remembered it?{' '}
        <Link to="/signin" className="text-ink underline">
          Sign in
        </Link>
      </p>
    </>
  );
}
