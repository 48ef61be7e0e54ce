import { MATERIAL_PROPERTIES, MATERIAL_PROPERTY_KEYS, unconfirmedKeys, type MaterialPropertyKey } from '@sheaf/engine';
import type { LibraryMaterial } from '@sheaf/engine/api';
import { BasisTag } from './BasisTag';
import { PropertySymbol } from './PropertySymbol';
import { SourceCaution } from './SourceCaution';
import { UnconfirmedTag } from './UnconfirmedTag';

/**
 * The values of a material that a check uses, each with its basis and its published source, as
 * a sheet shows them under a criterion or point-set cell. `keys` limits the list (the strengths a
 * theory needs); all values are listed otherwise. A value whose source could not be confirmed is
 * marked beside its basis, and a caution under the list names it.
 */
export function MaterialValues({
  material,
  keys,
  caption,
}: {
  material: LibraryMaterial;
  keys?: readonly MaterialPropertyKey[];
  caption?: string;
}) {
  const shown = MATERIAL_PROPERTY_KEYS.filter((k) => (keys ? keys.includes(k) : true) && material.properties[k]);
  const missing = (keys ?? []).filter((k) => !material.properties[k]);
  const unconfirmed = unconfirmedKeys(material, shown);
  return (
    <figure className="text-[0.8125rem]">
      <figcaption className="mb-1 text-ink-muted">
        {caption ?? 'Values used'}: <span className="font-medium text-ink">{material.name}</span>{' '}
        <span className="font-mono text-ink-faint">({material.id}{material.builtin ? ', built-in' : ''})</span>
      </figcaption>
      <dl className="grid grid-cols-[max-content_max-content_1fr] gap-x-3 gap-y-0.5">
        {shown.map((key) => {
          const entry = material.properties[key]!;
          return (
            <div key={key} className="contents">
              <dt title={MATERIAL_PROPERTIES[key].label}>
                <PropertySymbol name={key} />
                <span className="sr-only"> ({MATERIAL_PROPERTIES[key].label})</span>
              </dt>
              <dd className="font-mono whitespace-nowrap">
                {entry.value}
                <BasisTag basis={entry.basis} />
                {entry.confirmed === false ? <UnconfirmedTag /> : null}
              </dd>
              <dd className="text-ink-muted">{entry.source}</dd>
            </div>
          );
        })}
      </dl>
      <SourceCaution keys={unconfirmed} use={keys ? 'this check' : undefined} />
      {missing.length > 0 ? (
        <p className="mt-1 text-fail">
          This material has no {missing.join(', ')}, which the check needs.
        </p>
      ) : null}
    </figure>
  );
}
