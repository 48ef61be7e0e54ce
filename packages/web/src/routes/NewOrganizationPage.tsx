import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { useCreateOrganization } from '../api/organizations';
import { FormAlert } from '../components/FormAlert';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { TextField } from '../components/TextField';
import { splitServerError } from '../forms/serverErrors';
import { checkMaxLength, checkRequired } from '../forms/validators';
import { useCurrentOrganization } from '../hooks/useCurrentOrganization';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/** /organizations/new — start an organization; its creator becomes its first owner. */
export function NewOrganizationPage() {
  useDocumentTitle('New organization');
  const create = useCreateOrganization();
  const { select } = useCurrentOrganization();
  const navigate = useNavigate();
  const [name, setName] = useState('');
  const [error, setError] = useState<string | undefined>();

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problem =
      checkRequired(name, 'Organization name') ?? checkMaxLength(name, 120, 'Organization name');
    setError(problem);
    if (problem) {
      (event.currentTarget.elements.namedItem('name') as HTMLInputElement | null)?.focus();
      return;
    }
    create.mutate(
      { name: name.trim() },
      {
        onSuccess: (organization) => {
          select(organization.id);
          navigate('/projects');
        },
      },
    );
  }

  const server = splitServerError(create.error, { name: 'Organization name' });
  return (
    <Paper className="max-w-2xl">
      <PageHeader
        title="New organization"
        subtitle="You will be its owner and can invite your team."
      />
      {server.form ? (
        <FormAlert title="The organization was not created">{server.form}</FormAlert>
      ) : null}
      <form
        noValidate
        onSubmit={onSubmit}
        aria-label="New organization"
        className="flex flex-wrap items-start gap-3"
      >
        <TextField
          className="w-full max-w-sm"
          label="Organization name"
          name="name"
          autoComplete="organization"
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={error ?? server.field.name}
          required
        />
        <button type="submit" className="btn btn-primary mt-[1.6rem]" disabled={create.isPending}>
          {create.isPending ? 'Creating…' : 'Create organization'}
        </button>
      </form>
    </Paper>
  );
}
