import type { UnitSystemId } from '@sheaf/engine';
import { sheetMeta } from '@sheaf/sheet-doc';
import type * as Y from 'yjs';
import { shearAxisOf } from '../doc/displaySettings';
import type { ShearAxisConvention } from '../figures/figureTypes';
import { useDocSnapshot } from './useDocSnapshot';

export interface SheetSettings {
  /** `meta.unitSystem`: how results are shown (SI when unset). */
  unitSystem: UnitSystemId;
  /** Which way the τ axis of Mohr's circles points (never changes a number). */
  shearAxis: ShearAxisConvention;
}

const defaults: SheetSettings = { unitSystem: 'SI', shearAxis: 'positive-down' };

function readSettings(doc: Y.Doc): SheetSettings {
  return {
    unitSystem: sheetMeta(doc).get('unitSystem') === 'US' ? 'US' : 'SI',
    shearAxis: shearAxisOf(doc),
  };
}

/** The sheet-wide display settings, shared by everyone in the sheet. */
export function useSheetSettings(doc: Y.Doc | null): SheetSettings {
  return useDocSnapshot(doc, readSettings, defaults);
}
