import { evaluateExpression, isExpressionProblem, MATERIAL_CATEGORIES, MATERIAL_PROPERTY_KEYS, type MaterialPropertyKey } from '@sheaf/engine';
import type { LibraryMaterial } from '@sheaf/engine/api';

/** A column the materials table can sort by. */
export type MaterialSortKey = 'name' | 'category' | MaterialPropertyKey;

export interface MaterialFilter {
  /** Words to find in the id, name, notes or sources. */
  text: string;
  /** A category, or '' for all. */
  category: string;
  origin: 'all' | 'builtin' | 'own';
}

export interface MaterialSort {
  key: MaterialSortKey;
  direction: 'ascending' | 'descending';
}

export interface MaterialRow {
  material: LibraryMaterial;
  /** Each value in SI base units, for sorting (absent when the material has no such value). */
  si: Partial<Record<MaterialPropertyKey, number>>;
}

/** The materials with their values in SI, computed once per list. */
export function materialRows(materials: readonly LibraryMaterial[]): MaterialRow[] {
  return materials.map((material) => {
    const si: Partial<Record<MaterialPropertyKey, number>> = {};
    for (const key of MATERIAL_PROPERTY_KEYS) {
      const entry = material.properties[key];
      if (!entry) continue;
      const q = evaluateExpression(entry.value, new Map());
      if (!isExpressionProblem(q)) si[key] = q.si;
    }
    return { material, si };
  });
}

function haystack(m: LibraryMaterial): string {
  const sources = Object.values(m.properties).map((v) => v?.source ?? '');
  return [m.id, m.name, m.notes, m.category, ...sources].join(' ').toLowerCase();
}

/**
 * Rows that pass the filter, sorted: numbers by their SI value (a material without the value
 * last, whichever the direction), names alphabetically, categories in the library's order; ties
 * keep the library's order.
 */
export function filterAndSortMaterials(rows: readonly MaterialRow[], filter: MaterialFilter, sort: MaterialSort): MaterialRow[] {
  const words = filter.text.toLowerCase().split(/\s+/).filter(Boolean);
  const kept = rows.filter(({ material: m }) => {
    if (filter.category && m.category !== filter.category) return false;
    if (filter.origin === 'builtin' && !m.builtin) return false;
    if (filter.origin === 'own' && m.builtin) return false;
    const text = haystack(m);
    return words.every((w) => text.includes(w));
  });
  const sign = sort.direction === 'ascending' ? 1 : -1;
  const indexed = kept.map((row, index) => ({ row, index }));
  indexed.sort((a, b) => {
    let order: number;
    if (sort.key === 'category') {
      // Categories in the library's order (steels first), not alphabetically.
      const rank = (m: LibraryMaterial) => (MATERIAL_CATEGORIES as readonly string[]).indexOf(m.category);
      order = sign * (rank(a.row.material) - rank(b.row.material));
    } else if (sort.key === 'name') {
      order = sign * a.row.material.name.localeCompare(b.row.material.name);
    } else {
      const [x, y] = [a.row.si[sort.key], b.row.si[sort.key]];
      if (x === undefined || y === undefined) order = x === undefined ? (y === undefined ? 0 : 1) : -1;
      else order = sign * (x - y);
    }
    return order !== 0 ? order : a.index - b.index;
  });
  return indexed.map((x) => x.row);
}
