import { useState } from 'react';
import type { LibraryMaterial } from '@sheaf/engine/api';
import { describeError } from '../api/ApiError';
import { useDeleteMaterial } from '../api/materials';
import { can, type Membership } from '../api/types';
import { ErrorPanel } from '../components/ErrorPanel';
import { FormAlert } from '../components/FormAlert';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { RequireOrganization } from '../components/RequireOrganization';
import { MaterialCsvPanel } from '../features/materials/MaterialCsvPanel';
import { MaterialForm } from '../features/materials/MaterialForm';
import { MaterialsTable } from '../features/materials/MaterialsTable';
import { useMaterials } from '../features/materials/useMaterials';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/**
 * /materials — the materials library: the built-in materials with the published source of each
 * value, and the organization's own (owners and engineers add, edit, import and export them).
 */
export function MaterialsPage() {
  useDocumentTitle('Materials');
  return <RequireOrganization>{(membership) => <MaterialsLibrary membership={membership} />}</RequireOrganization>;
}

function MaterialsLibrary({ membership }: { membership: Membership }) {
  const organizationId = membership.organization.id;
  const materials = useMaterials(organizationId);
  const canWrite = can(membership.role, 'material.write');
  const [editing, setEditing] = useState<LibraryMaterial | 'new' | null>(null);
  const remove = useDeleteMaterial(organizationId);

  function onDelete(material: LibraryMaterial) {
    if (window.confirm(`Remove ${material.name} (${material.id}) from the library? Issued revisions keep the values frozen into them; live sheets that name it will report an unknown material.`)) {
      remove.mutate(material.id);
    }
  }

  return (
    <div className="space-y-4">
      <Paper>
        <PageHeader
          title="Materials"
          subtitle={`Materials library of ${membership.organization.name}: built-in values with their published sources, and your own`}
          actions={
            canWrite && editing === null ? (
              <button type="button" className="btn btn-primary" onClick={() => setEditing('new')}>
                Add a material
              </button>
            ) : undefined
          }
        />
        <p className="mb-3 max-w-prose text-[0.8125rem] text-ink-muted">
          Check every value against the governing specification and the material certificate before relying on it: these values
          support, not replace, the judgement of a qualified engineer. A specification minimum is labelled as such; handbook
          values are typical, not guaranteed.
        </p>
        {editing !== null ? (
          <div className="mb-5 rounded-[3px] border border-paper-rule bg-paper-sunk p-4">
            <h2 className="mb-3 text-[1rem]">{editing === 'new' ? 'New material' : `Edit ${editing.name}`}</h2>
            <MaterialForm
              key={editing === 'new' ? 'new' : editing.id}
              organizationId={organizationId}
              material={editing === 'new' ? undefined : editing}
              onDone={() => setEditing(null)}
            />
          </div>
        ) : null}
        {remove.error ? <FormAlert title="The material was not removed">{describeError(remove.error)}</FormAlert> : null}
        {materials.isPending ? (
          <Loading what="the materials library" />
        ) : materials.isError ? (
          <ErrorPanel error={materials.error} what="the materials library" />
        ) : (
          <MaterialsTable
            materials={materials.data}
            actions={
              canWrite
                ? (m) => (
                    <span className="flex gap-1">
                      <button type="button" className="btn px-2 py-0.5 text-[0.75rem]" onClick={() => setEditing(m)} aria-label={`Edit ${m.name}`}>
                        Edit
                      </button>
                      <button type="button" className="btn btn-danger px-2 py-0.5 text-[0.75rem]" onClick={() => onDelete(m)} aria-label={`Remove ${m.name}`}>
                        Remove
                      </button>
                    </span>
                  )
                : undefined
            }
          />
        )}
      </Paper>
      <Paper>
        <MaterialCsvPanel organizationId={organizationId} canWrite={canWrite} />
      </Paper>
    </div>
  );
}
