import { useState, type FormEvent } from 'react';
import { Link, useParams } from 'react-router-dom';
import { isApiError } from '../api/ApiError';
import { useConfirmPasswordReset } from '../api/auth';
import { FormAlert, FormNotice } from '../components/FormAlert';
import { TextField } from '../components/TextField';
import { splitServerError } from '../forms/serverErrors';
import {
  checkPassword,
  collectErrors,
  PASSWORD_MIN_LENGTH,
  type FieldErrors,
} from '../forms/validators';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

type Field = 'password' | 'confirm';
const FIELDS: readonly Field[] = ['password', 'confirm'];

/** /reset/:token — the link from the reset e-mail: choose a new password. */
export function ResetConfirmPage() {
  useDocumentTitle('Choose a new password');
  const { token = '' } = useParams();
  const confirmReset = useConfirmPasswordReset();
  const [password, setPassword] = useState('');
  const [confirm, setConfirm] = useState('');
  const [errors, setErrors] = useState<FieldErrors<Field>>({});

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const found = collectErrors<Field>({
      password: checkPassword(password, 'New password'),
      confirm: confirm !== password ? 'Repeat password must match the new password.' : undefined,
    });
    setErrors(found);
    const firstInvalid = FIELDS.find((f) => found[f]);
    if (firstInvalid) {
      (event.currentTarget.elements.namedItem(firstInvalid) as HTMLInputElement | null)?.focus();
      return;
    }
    confirmReset.mutate({ token, password });
  }

  if (confirmReset.isSuccess) {
    return (
      <>
        <h1 className="mb-4 text-[1.25rem]">Password changed</h1>
        <FormNotice>Your new password is set. Sign in with it now.</FormNotice>
        <Link to="/signin" className="btn btn-primary">
          Sign in
        </Link>
      </>
    );
  }

  const error = confirmReset.error;
  const expired = isApiError(error) && error.status === 410;
  // The server names the token when the link is unknown or already used.
  const unusable = isApiError(error) && error.fieldErrors.token !== undefined;
  const server = splitServerError(error, { password: 'New password' });

  return (
    <>
      <h1 className="mb-1 text-[1.25rem]">Choose a new password</h1>
      <p className="mb-5 text-ink-muted">For the account this reset link was sent to.</p>
      {expired || unusable ? (
        <FormAlert
          title={expired ? 'This reset link has expired' : 'This reset link cannot be used'}
        >
          {expired ? 'Links work for a limited time and only once.' : error.fieldErrors.token}{' '}
          <Link to="/reset" className="underline">
            Request a new link
          </Link>
          .
        </FormAlert>
      ) : server.form ? (
        <FormAlert title="The password was not changed">{server.form}</FormAlert>
      ) : null}
      <form noValidate onSubmit={onSubmit} aria-label="Choose a new password" className="space-y-4">
        <TextField
          label="New password"
          name="password"
          type="password"
          autoComplete="new-password"
          hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={errors.password ?? server.field.password}
          required
        />
        <TextField
          label="Repeat password"
          name="confirm"
          type="password"
          autoComplete="new-password"
          value={confirm}
          onChange={(e) => setConfirm(e.target.value)}
          error={errors.confirm}
          required
        />
        <button type="submit" className="btn btn-primary" disabled={confirmReset.isPending}>
          {confirmReset.isPending ? 'Saving…' : 'Set new password'}
        </button>
      </form>
    </>
  );
}
