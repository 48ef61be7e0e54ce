import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { useSignIn } from '../api/auth';
import { FormAlert } from '../components/FormAlert';
import { TextField } from '../components/TextField';
import { splitServerError } from '../forms/serverErrors';
import { checkEmail, checkPassword, collectErrors, type FieldErrors } from '../forms/validators';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { safeNextPath } from '../lib/safeNextPath';

type Field = 'email' | 'password';
const FIELDS: readonly Field[] = ['email', 'password'];
const LABELS: Record<Field, string> = { email: 'E-mail', password: 'Password' };

/** Sign in with e-mail and password, or through GitHub; then back to where the visitor was going. */
export function SignInPage() {
  useDocumentTitle('Sign in');
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'), '/sheets');
  const navigate = useNavigate();
  const signIn = useSignIn();
  const [email, setEmail] = useState(params.get('email') ?? '');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<FieldErrors<Field>>({});

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const found = collectErrors<Field>({
      email: checkEmail(email),
      password: checkPassword(password),
    });
    setErrors(found);
    const firstInvalid = FIELDS.find((f) => found[f]);
    if (firstInvalid) {
      (event.currentTarget.elements.namedItem(firstInvalid) as HTMLInputElement | null)?.focus();
      return;
    }
    signIn.mutate(
      { email: email.trim(), password },
      { onSuccess: () => navigate(next, { replace: true }) },
    );
  }

  const server = splitServerError(signIn.error, LABELS);
  const nextQuery = next !== '/sheets' ? `?next=${encodeURIComponent(next)}` : '';

  return (
    <>
      <h1 className="mb-1 text-[1.25rem]">Sign in</h1>
      <p className="mb-5 text-ink-muted">to your organization's calculation sheets.</p>
      {server.form ? <FormAlert title="Sign-in failed">{server.form}</FormAlert> : null}
      <form noValidate onSubmit={onSubmit} aria-label="Sign in" className="space-y-4">
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
          autoComplete="current-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={errors.password ?? server.field.password}
          required
        />
        <div className="flex items-center justify-between gap-3">
          <button type="submit" className="btn btn-primary" disabled={signIn.isPending}>
            {signIn.isPending ? 'Signing in…' : 'Sign in'}
          </button>
          <Link to="/reset" className="text-ink-muted underline">
            Forgot your password?
          </Link>
        </div>
      </form>
      <div
        className="my-5 flex items-center gap-3 text-[0.8125rem] text-ink-faint"
        aria-hidden="true"
      >
        <span className="h-px flex-1 bg-paper-line" />
        or
        <span className="h-px flex-1 bg-paper-line" />
      </div>
      {/* A plain link: the server runs the OAuth dance and sets the session cookie. */}
      <a href="/auth/github" className="btn w-full justify-center">
        <BranchGlyph />
        Sign in with GitHub
      </a>
      <p className="mt-5 text-ink-muted">
        New to Sheaf?{' '}
        <Link to={`/signup${nextQuery}`} className="text-ink underline">
          Create an account
        </Link>
      </p>
    </>
  );
}

/** Our own small branch glyph for the code-host sign-in button (not the host's logo). */
function BranchGlyph() {
  return (
    <svg width="14" height="14" viewBox="0 0 14 14" aria-hidden="true" focusable="false">
      <circle cx="3.5" cy="3" r="1.6" fill="none" stroke="currentColor" strokeWidth="1.3" />
      <circle cx="3.5" cy="11" r="1.6" fill="none" stroke="currentColor" strokeWidth="1.3" />
      <circle cx="10.5" cy="5" r="1.6" fill="none" stroke="currentColor" strokeWidth="1.3" />
      <path
        d="M3.5 4.6v4.8M10.5 6.6c0 2-2.5 2.2-5.5 3.2"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.3"
      />
    </svg>
  );
}
