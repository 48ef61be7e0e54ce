import { UNIT_SYSTEM_IDS } from '@sheaf/engine';
import type * as Y from 'yjs';
import { setShearAxis, SHEAR_AXES } from './doc/displaySettings';
import { setMetaField } from './doc/fieldWrites';
import { useSheetSettings } from './hooks/useSheetSettings';

const SYSTEM_LABEL: Record<(typeof UNIT_SYSTEM_IDS)[number], string> = {
  SI: 'SI (MPa, kN, mm)',
  US: 'US customary (ksi, kip, in)',
};

/**
 * The sheet-wide settings: the unit system results are shown in (stored as `meta.unitSystem`)
 * and which way Mohr's circles draw the τ axis. Neither changes a number.
 */
export function SheetSettingsBar({ doc, readOnly }: { doc: Y.Doc; readOnly: boolean }) {
  const { unitSystem, shearAxis } = useSheetSettings(doc);
  return (
    <div className="flex flex-wrap items-end gap-x-4 gap-y-2">
      <label className="text-[0.8125rem] text-ink-muted">
        Units
        <select
          className="input mt-0.5 w-auto py-1 text-ink"
          value={unitSystem}
          disabled={readOnly}
          onChange={(event) => setMetaField(doc, 'unitSystem', event.target.value)}
        >
          {UNIT_SYSTEM_IDS.map((id) => (
            <option key={id} value={id}>
              {SYSTEM_LABEL[id]}
            </option>
          ))}
        </select>
      </label>
      <label className="text-[0.8125rem] text-ink-muted">
        Mohr&rsquo;s circle shear axis
        <select
          className="input mt-0.5 w-auto py-1 text-ink"
          value={shearAxis}
          disabled={readOnly}
          onChange={(event) => setShearAxis(doc, event.target.value === 'clockwise-up' ? 'clockwise-up' : 'positive-down')}
        >
          {SHEAR_AXES.map((axis) => (
            <option key={axis.id} value={axis.id}>
              {axis.label}
            </option>
          ))}
        </select>
      </label>
    </div>
  );
}
