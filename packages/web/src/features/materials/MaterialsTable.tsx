import { useMemo, useState } from 'react';
import { MATERIAL_CATEGORIES, MATERIAL_PROPERTY_KEYS, type MaterialCategory, type MaterialPropertyKey } from '@sheaf/engine';
import type { LibraryMaterial } from '@sheaf/engine/api';
import { BasisTag } from './BasisTag';
import { CATEGORY_LABEL } from './categoryLabels';
import { filterAndSortMaterials, materialRows, type MaterialFilter, type MaterialSort, type MaterialSortKey } from './materialRows';
import { PropertySymbol } from './PropertySymbol';
import { UnconfirmedTag } from './UnconfirmedTag';

/** Group a material's values by their source, as "Sy, Sut: source" lines; an unconfirmed value never shares a line with a confirmed one. */
function sourceLines(m: LibraryMaterial): { keys: MaterialPropertyKey[]; source: string; unconfirmed: boolean }[] {
  const lines: { keys: MaterialPropertyKey[]; source: string; unconfirmed: boolean }[] = [];
  for (const key of MATERIAL_PROPERTY_KEYS) {
    const entry = m.properties[key];
    if (!entry) continue;
    const unconfirmed = entry.confirmed === false;
    const line = lines.find((l) => l.source === entry.source && l.unconfirmed === unconfirmed);
    if (line) line.keys.push(key);
    else lines.push({ keys: [key], source: entry.source, unconfirmed });
  }
  return lines;
}

function SortHeader({
  label,
  sortKey,
  sort,
  onSort,
  numeric,
}: {
  label: React.ReactNode;
  sortKey: MaterialSortKey;
  sort: MaterialSort;
  onSort: (key: MaterialSortKey) => void;
  numeric?: boolean;
}) {
  const active = sort.key === sortKey;
  return (
    <th scope="col" aria-sort={active ? sort.direction : 'none'} className={numeric ? 'text-right' : undefined}>
      <button type="button" className="inline-flex items-center gap-1 hover:underline" onClick={() => onSort(sortKey)}>
        {label}
        <span aria-hidden="true" className="font-mono text-[0.6875rem]">
          {active ? (sort.direction === 'ascending' ? '▲' : '▼') : '↕'}
        </span>
      </button>
    </th>
  );
}

const VALUE_COLUMNS: MaterialPropertyKey[] = ['Sy', 'Sut', 'Suc', 'E', 'nu', 'c', 'phi'];

/**
 * The materials library as a dense ruled table: values with their basis, grouped sources, sortable
 * by any column (values by their size in SI, whatever unit they are written in) and filtered by
 * words, category and origin. `actions` renders the edit controls of a row, when allowed.
 */
export function MaterialsTable({
  materials,
  actions,
}: {
  materials: readonly LibraryMaterial[];
  actions?: (material: LibraryMaterial) => React.ReactNode;
}) {
  const rows = useMemo(() => materialRows(materials), [materials]);
  const [filter, setFilter] = useState<MaterialFilter>({ text: '', category: '', origin: 'all' });
  const [sort, setSort] = useState<MaterialSort>({ key: 'category', direction: 'ascending' });
  const shown = filterAndSortMaterials(rows, filter, sort);

  function onSort(key: MaterialSortKey) {
    setSort((current) =>
      current.key === key
        ? { key, direction: current.direction === 'ascending' ? 'descending' : 'ascending' }
        : { key, direction: key === 'name' || key === 'category' ? 'ascending' : 'descending' },
    );
  }

  return (
    <div>
      <div role="search" aria-label="Filter materials" className="mb-3 flex flex-wrap items-end gap-x-5 gap-y-3">
        <div className="w-full max-w-xs">
          <label htmlFor="material-filter" className="mb-1 block font-medium">
            Find
          </label>
          <input
            id="material-filter"
            type="search"
            className="input"
            placeholder="Name, id, standard or handbook"
            value={filter.text}
            onChange={(e) => setFilter({ ...filter, text: e.target.value })}
          />
        </div>
        <div>
          <label htmlFor="material-category" className="mb-1 block font-medium">
            Category
          </label>
          <select
            id="material-category"
            className="input"
            value={filter.category}
            onChange={(e) => setFilter({ ...filter, category: e.target.value })}
          >
            <option value="">All categories</option>
            {MATERIAL_CATEGORIES.map((c) => (
              <option key={c} value={c}>
                {CATEGORY_LABEL[c]}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="material-origin" className="mb-1 block font-medium">
            Library
          </label>
          <select
            id="material-origin"
            className="input"
            value={filter.origin}
            onChange={(e) => setFilter({ ...filter, origin: e.target.value as MaterialFilter['origin'] })}
          >
            <option value="all">Built-in and ours</option>
            <option value="builtin">Built-in only</option>
            <option value="own">Ours only</option>
          </select>
        </div>
      </div>
      <p className="mb-2 text-[0.8125rem] text-ink-muted" aria-live="polite">
        {shown.length} of {rows.length} materials. Values as published, with their basis: <BasisTag basis="minimum" /> specification
        minimum, <BasisTag basis="typical" /> typical, <BasisTag basis="design" /> design value. <UnconfirmedTag /> marks a value
        whose source could not be confirmed: verify it against the specification or the material certificate before relying on it.
      </p>
      <div className="overflow-x-auto">
        <table className="ruled text-[0.8125rem] [&_tbody_td]:border-b-0">
          <caption className="sr-only">Materials library, sortable by each column; each material's sources under its values</caption>
          <thead>
            <tr>
              <SortHeader label="Material" sortKey="name" sort={sort} onSort={onSort} />
              <SortHeader label="Category" sortKey="category" sort={sort} onSort={onSort} />
              {VALUE_COLUMNS.map((key) => (
                <SortHeader key={key} label={<PropertySymbol name={key} />} sortKey={key} sort={sort} onSort={onSort} numeric />
              ))}
              {actions ? (
                <th scope="col">
                  <span className="sr-only">Actions</span>
                </th>
              ) : null}
            </tr>
          </thead>
          {shown.map(({ material: m }) => (
            <tbody key={m.id} className="border-b border-paper-line">
              <tr className="[&>td]:border-b-0">
                <td className="min-w-[13rem]">
                  <span className="font-medium">{m.name}</span>
                  <span className="block font-mono text-[0.75rem] text-ink-faint">
                    {m.id}
                    {m.builtin ? ' · built-in' : ' · ours'}
                  </span>
                </td>
                <td className="whitespace-nowrap">{CATEGORY_LABEL[m.category as MaterialCategory]}</td>
                {VALUE_COLUMNS.map((key) => {
                  const entry = m.properties[key];
                  return (
                    <td key={key} className="text-right font-mono whitespace-nowrap">
                      {entry ? (
                        <>
                          {entry.value}
                          <BasisTag basis={entry.basis} />
                          {entry.confirmed === false ? <UnconfirmedTag /> : null}
                        </>
                      ) : (
                        <span className="text-ink-faint" aria-label="none">
                          —
                        </span>
                      )}
                    </td>
                  );
                })}
                {actions ? <td className="whitespace-nowrap">{m.builtin ? null : actions(m)}</td> : null}
              </tr>
              <tr className="[&>td]:pt-0">
                <td colSpan={2 + VALUE_COLUMNS.length + (actions ? 1 : 0)} className="text-[0.75rem] text-ink-muted">
                  <span className="sr-only">Sources of {m.name}: </span>
                  <ul className="space-y-0.5 pl-3">
                    {sourceLines(m).map((line) => (
                      <li key={`${line.unconfirmed}|${line.source}`}>
                        <span className="font-mono text-ink">{line.keys.join(', ')}</span>
                        {line.unconfirmed ? <UnconfirmedTag /> : null}: {line.source}
                      </li>
                    ))}
                  </ul>
                  {m.notes ? <p className="mt-0.5 pl-3 italic">{m.notes}</p> : null}
                </td>
              </tr>
            </tbody>
          ))}
        </table>
      </div>
    </div>
  );
}
