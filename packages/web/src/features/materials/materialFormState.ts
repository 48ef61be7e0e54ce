import {
  MATERIAL_PROPERTY_KEYS,
  checkMaterialValues,
  materialRecordSchema,
  type MaterialBasis,
  type MaterialCategory,
  type MaterialPropertyKey,
  type MaterialRecord,
} from '@sheaf/engine';
import type { LibraryMaterial } from '@sheaf/engine/api';

/** What the material form holds: every field as typed. */
export interface MaterialDraft {
  id: string;
  name: string;
  category: MaterialCategory;
  notes: string;
  properties: Record<MaterialPropertyKey, { value: string; basis: MaterialBasis; source: string }>;
}

const emptyValue = () => ({ value: '', basis: 'typical' as MaterialBasis, source: '' });

/** A blank draft, or one filled from a material being edited. */
export function draftOf(material?: LibraryMaterial): MaterialDraft {
  const properties = Object.fromEntries(
    MATERIAL_PROPERTY_KEYS.map((key) => [key, material?.properties[key] ? { ...material.properties[key]! } : emptyValue()]),
  ) as MaterialDraft['properties'];
  return {
    id: material?.id ?? '',
    name: material?.name ?? '',
    category: material?.category ?? 'carbon-steel',
    notes: material?.notes ?? '',
    properties,
  };
}

/**
 * The record a draft makes (a property whose value and source are both empty is left out), or
 * the problems by field path (`properties.Sy.value`, `id`, ...), checked by the same schema and
 * value checks as the server.
 */
export function recordOfDraft(draft: MaterialDraft): { record: MaterialRecord } | { errors: Record<string, string> } {
  const properties: Partial<Record<MaterialPropertyKey, { value: string; basis: MaterialBasis; source: string }>> = {};
  for (const key of MATERIAL_PROPERTY_KEYS) {
    const entry = draft.properties[key];
    if (entry.value.trim() === '' && entry.source.trim() === '') continue;
    properties[key] = entry;
  }
  const errors: Record<string, string> = {};
  const parsed = materialRecordSchema.safeParse({ ...draft, properties });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const path = issue.path.join('.');
      errors[path] ??= issue.message;
    }
  }
  // Values are checked even when another field failed, so every problem shows at once.
  for (const problem of checkMaterialValues({ properties })) {
    if (problem.field !== 'properties' || parsed.success) errors[problem.field] ??= problem.message.slice(problem.field.length + 2);
  }
  return Object.keys(errors).length > 0 || !parsed.success ? { errors } : { record: parsed.data };
}
