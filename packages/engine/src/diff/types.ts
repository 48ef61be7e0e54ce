import type { MachineOutput } from '../sheet/machineOutput';

/**
 * One side of a comparison: an issued revision (or the draft in preparation) as the server keeps
 * it: the sheet content in the file format and the results the engine computed from it.
 * @public
 */
export interface RevisionSnapshot {
  /** Revision number; the draft in preparation uses the number it will be issued under. */
  readonly number: number;
  readonly content: {
    readonly title?: string;
    readonly unitSystem?: string;
    readonly cells: readonly { readonly id: string; readonly [field: string]: unknown }[];
  };
  readonly results: MachineOutput;
}

/** A cell named in a diff: stable id, kind, name, and its place (0-based) in its revision. @public */
export interface DiffCellRef {
  readonly id: string;
  readonly kind: string;
  readonly name: string | null;
  readonly index: number;
}

/**
 * One input field that differs: `field` is the path (`expr`, `strength.Sy`); `old` and `new` are
 * the field's text as written in the sheet, or null where the field is absent.
 * @public
 */
export interface InputChange {
  readonly field: string;
  readonly old: string | null;
  readonly new: string | null;
}

/** A cell present in both revisions whose inputs changed or which moved in the order. @public */
export interface ChangedCell extends DiffCellRef {
  /** Its place in the older revision. */
  readonly oldIndex: number;
  readonly inputs: readonly InputChange[];
  /** True when the cell moved relative to the cells around it (not merely shifted by an insertion). */
  readonly moved: boolean;
}

/** A result value ready to read: text with units (`47.656 MPa`, `pass`, `unbounded`), SI number where there is one. @public */
export interface DiffValue {
  readonly text: string;
  /** The value in SI base units, or null for flags, lists, unbounded factors and errors. */
  readonly si: number | null;
  /** Display unit of `text` ('' for plain numbers and words). */
  readonly unit: string;
}

/** Verdict of a check cell (criterion or point set): its `pass` flag, or no verdict. @public */
export type Verdict = 'pass' | 'fail' | 'none';

/**
 * One result value that moved. `key` is the value's name in the result (`factor`, `p1`), or
 * null when the whole cell went from a value to an error or back.
 * @public
 */
export interface ResultChange {
  readonly cellId: string;
  readonly cellName: string;
  readonly kind: string;
  readonly key: string | null;
  /** null when the value did not exist in the older revision. */
  readonly old: DiffValue | null;
  /** null when the value does not exist in the newer revision. */
  readonly new: DiffValue | null;
  /** Set on the `pass` value when the verdict flipped. */
  readonly crossing: 'pass-to-fail' | 'fail-to-pass' | null;
}

/** A check cell whose verdict flipped between the revisions. @public */
export interface VerdictCrossing {
  readonly cellId: string;
  readonly cellName: string;
  readonly from: Verdict;
  readonly to: Verdict;
  readonly direction: 'pass-to-fail' | 'fail-to-pass';
}

/** Everything that differs between two revisions of a sheet. @public */
export interface RevisionDiff {
  readonly from: number;
  readonly to: number;
  /** Title and unit system changes (`field` is `title` or `unitSystem`). */
  readonly sheet: readonly InputChange[];
  readonly added: readonly DiffCellRef[];
  readonly removed: readonly DiffCellRef[];
  readonly changed: readonly ChangedCell[];
  /** Result values that moved, in the newer revision's cell order. */
  readonly results: readonly ResultChange[];
  /** Verdicts that flipped: the changes to read first. */
  readonly crossings: readonly VerdictCrossing[];
}
