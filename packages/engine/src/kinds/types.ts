import type { z } from 'zod';
import type { StressTensor } from '../stress/types';
import type { ExpectedDimension } from '../units/checkDimension';
import type { Quantity } from '../units/expression';
import type { UnitSystemId } from '../units/unitSystems';
import type { KindId } from './kindIds';
import type { MaterialsLookup } from './materials';
import type { CellFailure, CellOk, CellResult } from './result';

/**
 * What a kind's `evaluate` gets besides its cell: field evaluation with dimension checks, the
 * results of the cells it refers to, and the materials list. Every method returns a value or a
 * failure that names the field; none throws.
 * @public
 */
export interface KindContext {
  readonly cellId: string;
  /** Evaluate an expression field to an SI number of the expected dimension. */
  value(field: string, expression: string, expected: ExpectedDimension): number | CellFailure;
  /** Evaluate an expression field of any dimension. */
  quantity(field: string, expression: string): Quantity | CellFailure;
  /** The stress state of the cell named in field `field` (a stress, rosette, rotate or principal cell). */
  state(field: string, name: string): StressTensor | CellFailure;
  /** The result of a referenced cell (ok: the sheet reports failed references as `upstream` first). */
  lookup(name: string): CellOk | undefined;
  readonly materials: MaterialsLookup | undefined;
}

/** What `equation` gets: the unit system to show numbers in, and referenced results. @public */
export interface EquationContext {
  readonly system: UnitSystemId;
  lookup(name: string): CellResult | undefined;
}

/** A field of a cell that holds an expression: its path (e.g. `strength.Sy`) and text. @public */
export type ExpressionField = readonly [field: string, expression: string];

/**
 * One cell kind: its id (stored in files), its schema, the names it depends on, its evaluate
 * (never throws) and its substituted equation for display.
 * @public
 */
export interface CellKind<C extends { readonly id: string; readonly kind: KindId }> {
  readonly id: C['kind'];
  /** Short human label. */
  readonly label: string;
  readonly schema: z.ZodType<C>;
  /** Expression fields: the free symbols in them are names this cell may depend on. */
  expressions(cell: C): readonly ExpressionField[];
  /** Fields that name a cell directly (`of`): [field, name]. */
  references(cell: C): readonly ExpressionField[];
  /** Evaluate a schema-valid cell whose referenced cells all evaluated. Never throws. */
  evaluate(cell: C, context: KindContext): CellResult;
  /** The governing equation with numbers substituted, as LaTeX for KaTeX; null when the kind has none. */
  equation(cell: C, result: CellOk, context: EquationContext): string | null;
}
