import { z } from 'zod';
import { ValuesBuilder } from './result';
import { cellIdSchema } from './schemaParts';
import type { CellKind } from './types';

/** A note cell: Markdown text with `$...$` math; no values. @public */
export const noteCellSchema = z
  .strictObject({
    id: cellIdSchema,
    kind: z.literal('note'),
    text: z.string({ error: 'must be a string' }).max(20000, { error: 'must be at most 20000 characters' }),
  })
  .meta({ title: 'note', description: 'Markdown text with $...$ math' });

/** @public */
export type NoteCell = z.infer<typeof noteCellSchema>;

/**
 * Note: text between calculations (load cases, assumptions, references). It has no name and no
 * values; it evaluates to an empty result.
 * @example noteKind.evaluate({ id: 'k1', kind: 'note', text: 'LC2' }, context).ok // true
 * @public
 */
export const noteKind: CellKind<NoteCell> = {
  id: 'note',
  label: 'Note',
  schema: noteCellSchema,
  expressions: () => [],
  references: () => [],
  evaluate: (cell) => new ValuesBuilder().ok(cell.id, 'note'),
  equation: () => null,
};
