import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { useSignUp } from '../api/auth';
import { FormAlert } from '../components/FormAlert';
import { TextField } from '../components/TextField';
import { splitServerError } from '../forms/serverErrors';
import {
  checkEmail,
  checkMaxLength,
  checkPassword,
  checkRequired,
  collectErrors,
  PASSWORD_MIN_LENGTH,
  type FieldErrors,
} from '../forms/validators';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { safeNextPath } from '../lib/safeNextPath';

type Field = 'name' | 'email' | 'password';
const FIELDS: readonly Field[] = ['name', 'email', 'password'];
const LABELS: Record<Field, string> = { name: 'Name', email: 'E-mail', password: 'Password' };

/** Create an account; signed in straight away, then on to `next` (an invitation, say). */
export function SignUpPage() {
  useDocumentTitle('Create an account');
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'), '/sheets');
  const navigate = useNavigate();
  const signUp = useSignUp();
  const [name, setName] = useState('');
  const [email, setEmail] = useState(params.get('email') ?? '');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<FieldErrors<Field>>({});

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const found = collectErrors<Field>({
      name: checkRequired(name, 'Name') ?? checkMaxLength(name, 120, 'Name'),
      email: checkEmail(email),
      password: checkPassword(password),
    });
    setErrors(found);
    const firstInvalid = FIELDS.find((f) => found[f]);
    if (firstInvalid) {
      (event.currentTarget.elements.namedItem(firstInvalid) as HTMLInputElement | null)?.focus();
      return;
    }
    signUp.mutate(
      { name: name.trim(), email: email.trim(), password },
      { onSuccess: () => navigate(next, { replace: true }) },
    );
  }

  const server = splitServerError(signUp.error, LABELS);
  const nextQuery = next !== '/sheets' ? `?next=${encodeURIComponent(next)}` : '';

  return (
    <>
      <h1 className="mb-1 text-[1.25rem]">Create an account</h1>
      <p className="mb-5 text-ink-muted">
        Your name appears on the sheets you prepare, check or approve.
      </p>
      {server.form ? (
        <FormAlert title="The account was not created">{server.form}</FormAlert>
      ) : null}
      <form noValidate onSubmit={onSubmit} aria-label="Create an account" className="space-y-4">
        <TextField
          label="Name"
          name="name"
          autoComplete="name"
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={errors.name ?? server.field.name}
          required
        />
        <TextField
          label="E-mail"
          name="email"
          type="email"
          autoComplete="email"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={errors.email ?? server.field.email}
          required
        />
        <TextField
          label="Password"
          name="password"
          type="password"
          autoComplete="new-password"
          hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={errors.password ?? server.field.password}
          required
        />
        <button type="submit" className="btn btn-primary" disabled={signUp.isPending}>
          {signUp.isPending ? 'Creating account…' : 'Create account'}
        </button>
      </form>
      <p className="mt-5 text-ink-muted">
        Already have an account?{' '}
        <Link to={`/signin${nextQuery}`} className="text-ink underline">
          Sign in
        </Link>
      </p>
    </>
  );
}
