import type * as Y from 'yjs';
import type { ShearAxisConvention } from '../figures/figureTypes';

/**
 * How the sheet draws things, shared by everyone in it but not part of the sheet file: a root
 * map of its own beside `meta`, `order` and `cells`, so exports and revisions (format v1) never
 * see it and it never changes a number.
 */
export const DISPLAY_KEY = 'display';

export const SHEAR_AXES: readonly { id: ShearAxisConvention; label: string }[] = [
  { id: 'positive-down', label: 'τ positive down' },
  { id: 'clockwise-up', label: 'τ clockwise up' },
];

export function sheetDisplay(doc: Y.Doc): Y.Map<unknown> {
  return doc.getMap(DISPLAY_KEY);
}

/** The sheet's shear-axis convention for Mohr's circles; `positive-down` when unset. */
export function shearAxisOf(doc: Y.Doc): ShearAxisConvention {
  return sheetDisplay(doc).get('shearAxis') === 'clockwise-up' ? 'clockwise-up' : 'positive-down';
}

export function setShearAxis(doc: Y.Doc, axis: ShearAxisConvention): void {
  sheetDisplay(doc).set('shearAxis', axis);
}
