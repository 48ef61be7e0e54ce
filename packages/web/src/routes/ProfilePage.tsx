import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { describeError } from '../api/ApiError';
import { useMe, useSignOut, useUpdateProfile } from '../api/auth';
import type { User } from '../api/types';
import { FormAlert, FormNotice } from '../components/FormAlert';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { TextField } from '../components/TextField';
import { splitServerError } from '../forms/serverErrors';
import { checkMaxLength, checkRequired } from '../forms/validators';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { ROLE_INFO } from '../lib/roles';

/** /profile — your name as it appears on sheets, your organizations, and signing out. */
export function ProfilePage() {
  useDocumentTitle('Profile');
  const me = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();
  if (!me.data) return <Loading what="your profile" />;
  const { user, memberships } = me.data;

  return (
    <div className="max-w-2xl space-y-4">
      <Paper>
        <PageHeader title="Profile" subtitle={<span className="font-mono">{user.email}</span>} />
        {/* Keyed by the saved name, so the form starts from it again after a save elsewhere. */}
        <NameForm key={user.name} user={user} />
      </Paper>
      <Paper>
        <h2 className="mb-2 text-[1rem]">Organizations</h2>
        {memberships.length === 0 ? (
          <p className="text-ink-muted">You do not belong to an organization yet.</p>
        ) : (
          <ul className="divide-y divide-paper-line border-y border-paper-line">
            {memberships.map((m) => (
              <li key={m.organization.id} className="flex justify-between gap-3 py-1.5">
                <span className="font-medium">{m.organization.name}</span>
                <span className="text-ink-muted">{ROLE_INFO[m.role].label}</span>
              </li>
            ))}
          </ul>
        )}
      </Paper>
      <Paper>
        <h2 className="mb-2 text-[1rem]">Sign out</h2>
        <p className="mb-3 text-ink-muted">Ends your session in this browser.</p>
        {signOut.isError ? (
          <FormAlert title="Sign-out failed">{describeError(signOut.error)}</FormAlert>
        ) : null}
        <button
          type="button"
          className="btn"
          disabled={signOut.isPending}
          onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate('/signin') })}
        >
          {signOut.isPending ? 'Signing out…' : 'Sign out'}
        </button>
      </Paper>
    </div>
  );
}

function NameForm({ user }: { user: User }) {
  const update = useUpdateProfile();
  const [name, setName] = useState(user.name);
  const [error, setError] = useState<string | undefined>();

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problem = checkRequired(name, 'Name') ?? checkMaxLength(name, 120, 'Name');
    setError(problem);
    if (problem) {
      (event.currentTarget.elements.namedItem('name') as HTMLInputElement | null)?.focus();
      return;
    }
    update.mutate({ name: name.trim() });
  }

  const server = splitServerError(update.error, { name: 'Name' });
  return (
    <>
      {update.isSuccess ? <FormNotice>Name saved.</FormNotice> : null}
      {server.form ? <FormAlert title="The name was not saved">{server.form}</FormAlert> : null}
      <form
        noValidate
        onSubmit={onSubmit}
        aria-label="Your name"
        className="flex flex-wrap items-start gap-3"
      >
        <TextField
          className="w-full max-w-sm"
          label="Name"
          name="name"
          autoComplete="name"
          hint="Shown in title blocks as who prepared, checked or approved a sheet."
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={error ?? server.field.name}
          required
        />
        <button type="submit" className="btn btn-primary mt-[1.6rem]" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save name'}
        </button>
      </form>
    </>
  );
}
