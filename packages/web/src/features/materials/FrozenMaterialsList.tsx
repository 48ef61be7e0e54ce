import type { FrozenMaterials } from '@sheaf/engine/api';
import { MaterialValues } from './MaterialValues';

/**
 * The library materials an issued revision used, as frozen at its approval: each value with its
 * basis and published source. Later edits of the library do not change them.
 */
export function FrozenMaterialsList({ materials }: { materials: FrozenMaterials | undefined }) {
  const list = Object.values(materials ?? {});
  if (list.length === 0) return null;
  return (
    <section aria-labelledby="frozen-materials" className="mt-4 border-t border-paper-rule pt-3">
      <h2 id="frozen-materials" className="mb-1 text-[1rem]">
        Materials used
      </h2>
      <p className="mb-2 text-[0.8125rem] text-ink-muted">
        Values as frozen at approval; later edits of the materials library do not change this revision.
      </p>
      <div className="space-y-3">
        {list.map((m) => (
          <MaterialValues key={m.id} material={m} caption="Material" />
        ))}
      </div>
    </section>
  );
}
