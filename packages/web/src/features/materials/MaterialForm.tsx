import { useState, type FormEvent } from 'react';
import { MATERIAL_BASES, MATERIAL_CATEGORIES, MATERIAL_PROPERTIES, MATERIAL_PROPERTY_KEYS, type MaterialCategory } from '@sheaf/engine';
import type { LibraryMaterial } from '@sheaf/engine/api';
import { describeError, isApiError } from '../../api/ApiError';
import { useCreateMaterial, useUpdateMaterial } from '../../api/materials';
import { FieldError } from '../../components/FieldError';
import { FormAlert } from '../../components/FormAlert';
import { CATEGORY_LABEL } from './categoryLabels';
import { draftOf, recordOfDraft, type MaterialDraft } from './materialFormState';
import { PropertySymbol } from './PropertySymbol';

/** Server field paths (`body.properties.Sy.value`) as the form's (`properties.Sy.value`). */
function serverErrors(error: unknown): Record<string, string> {
  if (!isApiError(error)) return {};
  const out: Record<string, string> = {};
  for (const [path, problem] of Object.entries(error.fieldErrors)) out[path.replace(/^body\./, '')] = problem;
  return out;
}

/**
 * Add an organization material, or edit one: name, category, notes, and for each value its
 * basis and published source (a standard or handbook with edition and table, or "from memory").
 */
export function MaterialForm({
  organizationId,
  material,
  onDone,
}: {
  organizationId: string;
  /** The material being edited; a new one when absent. */
  material?: LibraryMaterial;
  onDone: (saved: LibraryMaterial | null) => void;
}) {
  const [draft, setDraft] = useState<MaterialDraft>(() => draftOf(material));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useCreateMaterial(organizationId);
  const update = useUpdateMaterial(organizationId);
  const saving = create.isPending || update.isPending;
  const fail = create.error ?? update.error;
  const shown = { ...serverErrors(fail), ...errors };
  const placed = Object.keys(serverErrors(fail)).length > 0;

  function set<K extends keyof MaterialDraft>(key: K, value: MaterialDraft[K]) {
    setDraft((d) => ({ ...d, [key]: value }));
  }

  async function onSubmit(event: FormEvent) {
    event.preventDefault();
    const result = recordOfDraft(draft);
    if ('errors' in result) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    try {
      const saved = material
        ? await update.mutateAsync({ key: material.id, name: result.record.name, category: result.record.category, notes: result.record.notes, properties: result.record.properties })
        : await create.mutateAsync(result.record);
      onDone(saved);
    } catch {
      // Shown from the mutation's error state.
    }
  }

  const field = (path: string) => shown[path];
  const idBase = material ? `edit-${material.id}` : 'new-material';

  return (
    <form onSubmit={onSubmit} noValidate aria-label={material ? `Edit ${material.name}` : 'New material'} className="space-y-4">
      {fail && !placed ? <FormAlert title="The material was not saved">{describeError(fail)}</FormAlert> : null}
      <div className="grid gap-3 sm:grid-cols-[12rem_1fr_12rem]">
        <div>
          <label htmlFor={`${idBase}-id`} className="mb-1 block font-medium">
            Id
          </label>
          <input
            id={`${idBase}-id`}
            className="input font-mono"
            value={draft.id}
            disabled={Boolean(material)}
            onChange={(e) => set('id', e.target.value)}
            aria-invalid={field('id') ? true : undefined}
            aria-describedby={`${idBase}-id-hint`}
          />
          {field('id') ? <FieldError id={`${idBase}-id-hint`}>Id {field('id')}</FieldError> : (
            <p id={`${idBase}-id-hint`} className="mt-1 text-[0.75rem] text-ink-muted">What cells name, e.g. hub-iron-lot-7</p>
          )}
        </div>
        <div>
          <label htmlFor={`${idBase}-name`} className="mb-1 block font-medium">
            Name
          </label>
          <input id={`${idBase}-name`} className="input" value={draft.name} onChange={(e) => set('name', e.target.value)} aria-invalid={field('name') ? true : undefined} />
          {field('name') ? <FieldError>Name {field('name')}</FieldError> : null}
        </div>
        <div>
          <label htmlFor={`${idBase}-category`} className="mb-1 block font-medium">
            Category
          </label>
          <select id={`${idBase}-category`} className="input" value={draft.category} onChange={(e) => set('category', e.target.value as MaterialCategory)}>
            {MATERIAL_CATEGORIES.map((c) => (
              <option key={c} value={c}>
                {CATEGORY_LABEL[c]}
              </option>
            ))}
          </select>
        </div>
      </div>

      <fieldset>
        <legend className="mb-1 font-medium">Values, each with its basis and published source</legend>
        <p className="mb-2 text-[0.8125rem] text-ink-muted">
          Write values with units (250 MPa, 36 ksi, 30 deg). Leave a row empty to leave the value out. Label specification
          minimums as minimum; say “from memory” in the source where you could not check the table.
        </p>
        <div className="grid grid-cols-[minmax(9rem,max-content)_9rem_8rem_1fr] items-start gap-x-2 gap-y-2">
          <span className="text-[0.75rem] text-ink-muted">Property</span>
          <span className="text-[0.75rem] text-ink-muted">Value</span>
          <span className="text-[0.75rem] text-ink-muted">Basis</span>
          <span className="text-[0.75rem] text-ink-muted">Source (standard or handbook, edition, table)</span>
          {MATERIAL_PROPERTY_KEYS.map((key) => {
            const entry = draft.properties[key];
            const setEntry = (patch: Partial<typeof entry>) =>
              setDraft((d) => ({ ...d, properties: { ...d.properties, [key]: { ...d.properties[key], ...patch } } }));
            const label = MATERIAL_PROPERTIES[key].label;
            const valueError = field(`properties.${key}.value`);
            const sourceError = field(`properties.${key}.source`);
            const basisError = field(`properties.${key}.basis`);
            return (
              <div key={key} className="contents">
                <span className="pt-1.5">
                  <PropertySymbol name={key} /> <span className="text-[0.8125rem] text-ink-muted">{label.replace(/ \S+$/, '')}</span>
                </span>
                <div>
                  <input
                    aria-label={`${label}, value`}
                    className="input font-mono"
                    placeholder={MATERIAL_PROPERTIES[key].example}
                    value={entry.value}
                    onChange={(e) => setEntry({ value: e.target.value })}
                    aria-invalid={valueError ? true : undefined}
                  />
                  {valueError ? <FieldError>{label}: {valueError}</FieldError> : null}
                </div>
                <div>
                  <select aria-label={`${label}, basis`} className="input" value={entry.basis} onChange={(e) => setEntry({ basis: e.target.value as typeof entry.basis })}>
                    {MATERIAL_BASES.map((b) => (
                      <option key={b} value={b}>
                        {b}
                      </option>
                    ))}
                  </select>
                  {basisError ? <FieldError>{basisError}</FieldError> : null}
                </div>
                <div>
                  <input
                    aria-label={`${label}, source`}
                    className="input"
                    value={entry.source}
                    onChange={(e) => setEntry({ source: e.target.value })}
                    aria-invalid={sourceError ? true : undefined}
                  />
                  {sourceError ? <FieldError>Source of {label} {sourceError}</FieldError> : null}
                </div>
              </div>
            );
          })}
        </div>
        {field('properties') ? <FieldError>{field('properties')}</FieldError> : null}
      </fieldset>

      <div>
        <label htmlFor={`${idBase}-notes`} className="mb-1 block font-medium">
          Notes
        </label>
        <textarea id={`${idBase}-notes`} className="input min-h-[3.5rem]" value={draft.notes} onChange={(e) => set('notes', e.target.value)} />
      </div>

      <div className="flex gap-2">
        <button type="submit" className="btn btn-primary" disabled={saving}>
          {saving ? 'Saving…' : material ? 'Save changes' : 'Add material'}
        </button>
        <button type="button" className="btn" onClick={() => onDone(null)}>
          Cancel
        </button>
      </div>
    </form>
  );
}
