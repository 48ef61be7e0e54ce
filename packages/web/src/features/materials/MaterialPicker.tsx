import { useId } from 'react';
import { MATERIAL_CATEGORIES, THEORIES, unconfirmedKeys, type MaterialCategory, type MaterialPropertyKey, type TheoryId } from '@sheaf/engine';
import type { LibraryMaterial } from '@sheaf/engine/api';
import { describeError } from '../../api/ApiError';
import { CATEGORY_LABEL } from './categoryLabels';
import { MaterialValues } from './MaterialValues';
import { SourceCaution } from './SourceCaution';
import { useMaterials } from './useMaterials';

export interface MaterialPickerProps {
  organizationId: string;
  /** The material id the cell names (`material`), or undefined for none. */
  value: string | undefined;
  onChange: (materialId: string | undefined) => void;
  /** The cell's failure theory: materials without the strengths it needs are offered but marked. */
  theory?: TheoryId;
  label?: string;
  disabled?: boolean;
  /** Hide the values-and-sources list under the choice (the caution on unconfirmed values stays). */
  compact?: boolean;
  /** Keep the label for assistive technology only (a row label sits beside the picker). */
  visuallyHiddenLabel?: boolean;
}

function lacks(material: LibraryMaterial, theory: TheoryId | undefined): string[] {
  if (!theory) return [];
  return THEORIES[theory].needs.filter((key) => !material.properties[key]);
}

/** The values the cell's check would take from the material that are not confirmed against their source. */
function unconfirmedFor(material: LibraryMaterial, theory: TheoryId | undefined): MaterialPropertyKey[] {
  return theory ? unconfirmedKeys(material, THEORIES[theory].needs) : unconfirmedKeys(material);
}

/**
 * The material choice of a criterion or point-set cell: the organization's library grouped by
 * category, and under it the values the check uses with their basis and published source. A
 * material whose values for the check are not confirmed against their source says so in its
 * option, and the values under the choice carry the caution.
 * Self-contained: it loads the library itself (one shared request).
 * @example <MaterialPicker organizationId={orgId} value={cell.material} theory={cell.theory} onChange={setMaterial} />
 */
export function MaterialPicker({ organizationId, value, onChange, theory, label = 'Material', disabled, compact, visuallyHiddenLabel }: MaterialPickerProps) {
  const id = useId();
  const materials = useMaterials(organizationId);
  const list = materials.data ?? [];
  const selected = value === undefined ? undefined : list.find((m) => m.id === value);
  const needs = theory ? THEORIES[theory].needs : undefined;
  const groups = MATERIAL_CATEGORIES.map((category) => [category, list.filter((m) => m.category === category)] as const).filter(
    ([, items]) => items.length > 0,
  );

  return (
    <div className="space-y-2">
      <div>
        <label htmlFor={id} className={visuallyHiddenLabel ? 'sr-only' : 'mb-1 block font-medium'}>
          {label}
        </label>
        <select
          id={id}
          className="input"
          value={value ?? ''}
          disabled={disabled || materials.isPending}
          onChange={(e) => onChange(e.target.value === '' ? undefined : e.target.value)}
          aria-describedby={`${id}-state`}
        >
          <option value="">{materials.isPending ? 'Loading the materials library…' : '— strengths typed in the cell —'}</option>
          {value !== undefined && !selected && !materials.isPending ? <option value={value}>{value} (not in the library)</option> : null}
          {groups.map(([category, items]) => (
            <optgroup key={category} label={CATEGORY_LABEL[category as MaterialCategory]}>
              {items.map((m) => {
                const missing = lacks(m, theory);
                const unconfirmed = unconfirmedFor(m, theory);
                return (
                  <option key={m.id} value={m.id}>
                    {m.name}
                    {m.builtin ? '' : ' (ours)'}
                    {missing.length > 0 ? ` — no ${missing.join(', ')}` : ''}
                    {unconfirmed.length > 0 ? ` — ${unconfirmed.join(', ')} source not confirmed` : ''}
                  </option>
                );
              })}
            </optgroup>
          ))}
        </select>
      </div>
      <div id={`${id}-state`}>
        {materials.isError ? (
          <p role="alert" className="text-[0.8125rem] text-fail">
            The materials library could not be loaded: {describeError(materials.error)}
          </p>
        ) : value !== undefined && !selected && !materials.isPending ? (
          <p className="text-[0.8125rem] text-fail">“{value}” is not in this organization’s materials library.</p>
        ) : selected && compact ? (
          <SourceCaution keys={unconfirmedFor(selected, theory)} use="this check" />
        ) : selected ? (
          <MaterialValues material={selected} keys={needs} />
        ) : null}
      </div>
    </div>
  );
}
