import { z } from 'zod';
import { criterionCellSchema, criterionKind, type CriterionCell } from './criterion';
import type { KindId } from './kindIds';
import { noteCellSchema, noteKind, type NoteCell } from './note';
import { pointsetCellSchema, pointsetKind, type PointsetCell } from './pointset';
import { principalCellSchema, principalKind, type PrincipalCell } from './principal';
import { quantityCellSchema, quantityKind, type QuantityCell } from './quantity';
import { rosetteCellSchema, rosetteKind, type RosetteCell } from './rosette';
import { rotateCellSchema, rotateKind, type RotateCell } from './rotate';
import { stressCellSchema, stressKind, type StressCell } from './stress';
import type { CellKind } from './types';

/** A cell of any kind (format version 1). @public */
export type Cell = NoteCell | QuantityCell | StressCell | RosetteCell | RotateCell | PrincipalCell | CriterionCell | PointsetCell;

/** The cell type of one kind. @public */
export type CellOf<K extends KindId> = Extract<Cell, { kind: K }>;

/** Cells that have a name (every kind but note). @public */
export type NamedCell = Exclude<Cell, NoteCell>;

/**
 * Every cell kind by id. Registration is explicit: a kind is an entry here, and the mapped type
 * makes a missing or mistyped entry a type error. Importing a kind file registers nothing.
 * @public
 */
export const KINDS: { readonly [K in KindId]: CellKind<CellOf<K>> } = {
  note: noteKind,
  quantity: quantityKind,
  stress: stressKind,
  rosette: rosetteKind,
  rotate: rotateKind,
  principal: principalKind,
  criterion: criterionKind,
  pointset: pointsetKind,
};

/** Schema of one cell of any kind, discriminated by `kind`. @public */
export const cellSchema = z
  .discriminatedUnion('kind', [
    noteCellSchema,
    quantityCellSchema,
    stressCellSchema,
    rosetteCellSchema,
    rotateCellSchema,
    principalCellSchema,
    criterionCellSchema,
    pointsetCellSchema,
  ])
  .meta({ id: 'SheafCell', description: 'A cell of a sheet; `kind` says which' });

/** The kind object of a cell, typed for it. @public */
export function kindOf<K extends KindId>(kind: K): CellKind<CellOf<K>> {
  return KINDS[kind];
}
