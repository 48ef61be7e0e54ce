import type { CellResult } from '@sheaf/engine';
import type { SheetFileCell } from '@sheaf/sheet-doc';
import type { ComponentType } from 'react';

/** What a kind's inputs and figure get. */
export interface KindViewProps {
  /** The cell's fields as plain JSON (strings for shared text). */
  cell: SheetFileCell;
  /** The cell's name ('' for notes or while it is being typed). */
  cellName: string;
  result: CellResult | undefined;
  /** The field the cell's error names, to mark its editor; null when none. */
  errorField: string | null;
  /** Id of the element that shows the cell's error. */
  errorId: string;
}

/** How one kind of cell appears in the editor. */
export interface KindView {
  /** The kind's name in the add menu and on the cell, e.g. "Stress state". */
  label: string;
  /** One line for the add menu: what the cell is for. */
  hint: string;
  Inputs: ComponentType<KindViewProps>;
  /** The kind's figure beside its result (Mohr's circle, failure envelope), if it has one. */
  Figure?: ComponentType<KindViewProps>;
}
