import { z } from 'zod';
import { Id, Timestamp } from './common';
import { FrozenMaterials } from './materials';
import { Person, ReviewState, Signature } from './review';
import { SheetContentV1 } from './sheets';

/**
 * Issued revisions of a sheet: immutable snapshots made at approval (content in the file format,
 * results computed by the server's engine, sha-256 of the canonical content, who prepared, checked
 * and approved it, when). No route changes or deletes one; the database refuses it as well.
 */

const ResultValue = z.union([z.number(), z.boolean(), z.null(), z.array(z.number().nullable())]);

/** The engine's machine output (numbers in SI base units), one entry per named cell. */
export const MachineOutputSchema = z
  .object({
    cells: z.record(
      z.string(),
      z.object({
        kind: z.string().nullable(),
        values: z.record(z.string(), ResultValue).optional(),
        error: z.object({ code: z.string(), message: z.string(), rootCellId: z.string().optional() }).optional(),
      }),
    ),
  })
  .meta({ id: 'MachineOutput' });

export const RevisionSummary = z
  .object({
    number: z.number().int().min(1),
    status: z.enum(['approved', 'superseded']),
    title: z.string(),
    contentSha256: z.string().regex(/^[0-9a-f]{64}$/),
    prepared: Signature,
    checked: Signature,
    approved: Signature,
    /** When a newer revision was approved; null for the current one. */
    supersededAt: Timestamp.nullable(),
    /** Set when the checker approved over open notes: their recorded reason. */
    overrideReason: z.string().nullable(),
    openNotesAtApproval: z.number().int().min(0),
  })
  .meta({ id: 'RevisionSummary' });
export type RevisionSummary = z.infer<typeof RevisionSummary>;

export const RevisionDetail = RevisionSummary.extend({
  content: SheetContentV1,
  results: MachineOutputSchema,
  /** The library materials it used, as frozen at approval (values, bases, sources). */
  materials: FrozenMaterials.optional(),
}).meta({
  id: 'RevisionDetail',
});
export type RevisionDetail = z.infer<typeof RevisionDetail>;

export const RevisionListResponse = z.object({ revisions: z.array(RevisionSummary) }).meta({ id: 'RevisionListResponse' });
export type RevisionListResponse = z.infer<typeof RevisionListResponse>;

export const RevisionResponse = z.object({ revision: RevisionDetail }).meta({ id: 'RevisionResponse' });
export type RevisionResponse = z.infer<typeof RevisionResponse>;

/** `POST /api/sheets/:sheetId/approve`: the new revision and the sheet's workflow state after it. */
export const ApproveSheetResponse = z
  .object({ revision: RevisionSummary, review: ReviewState })
  .meta({ id: 'ApproveSheetResponse' });
export type ApproveSheetResponse = z.infer<typeof ApproveSheetResponse>;

export const RevisionParams = z.object({ sheetId: Id, number: z.coerce.number().int().min(1).max(1_000_000) });

/** `GET /api/sheets/:sheetId/diff?from=1&to=2`; `to=current` compares with the sheet as it is now. */
export const DiffQuery = z.object({
  from: z.coerce.number({ error: 'must be a revision number' }).int({ error: 'must be a whole number' }).min(1, { error: 'must be at least 1' }),
  to: z.union([z.literal('current'), z.coerce.number({ error: 'must be a revision number or "current"' }).int().min(1)]),
});
export type DiffQuery = z.infer<typeof DiffQuery>;

const InputChangeSchema = z.object({ field: z.string(), old: z.string().nullable(), new: z.string().nullable() });
const DiffCellRefSchema = z.object({ id: z.string(), kind: z.string(), name: z.string().nullable(), index: z.number().int() });
const DiffValueSchema = z.object({ text: z.string(), si: z.number().nullable(), unit: z.string() });
const Crossing = z.enum(['pass-to-fail', 'fail-to-pass']);
const VerdictSchema = z.enum(['pass', 'fail', 'none']);

/** The engine's revision diff (see `diffRevisions`), as the API sends it. */
export const RevisionDiffSchema = z
  .object({
    from: z.number().int(),
    to: z.number().int(),
    sheet: z.array(InputChangeSchema),
    added: z.array(DiffCellRefSchema),
    removed: z.array(DiffCellRefSchema),
    changed: z.array(DiffCellRefSchema.extend({ oldIndex: z.number().int(), inputs: z.array(InputChangeSchema), moved: z.boolean() })),
    results: z.array(
      z.object({
        cellId: z.string(),
        cellName: z.string(),
        kind: z.string(),
        key: z.string().nullable(),
        old: DiffValueSchema.nullable(),
        new: DiffValueSchema.nullable(),
        crossing: Crossing.nullable(),
      }),
    ),
    crossings: z.array(
      z.object({ cellId: z.string(), cellName: z.string(), kind: z.string(), from: VerdictSchema, to: VerdictSchema, direction: Crossing }),
    ),
  })
  .meta({ id: 'RevisionDiff' });

export const RevisionDiffResponse = z
  .object({
    diff: RevisionDiffSchema,
    from: RevisionSummary,
    /** null when comparing with the sheet as it is now (the revision in preparation). */
    to: RevisionSummary.nullable(),
  })
  .meta({ id: 'RevisionDiffResponse' });
export type RevisionDiffResponse = z.infer<typeof RevisionDiffResponse>;

/** Events of a sheet's history, in the trade's words. */
export const HISTORY_ACTIONS = [
  'sheet.submitted',
  'sheet.returned',
  'sheet.approved',
  'sheet.checker-reassigned',
  'sheet.reopened',
  'note.created',
  'note.resolved',
  'note.reopened',
] as const;
export const HistoryAction = z.enum(HISTORY_ACTIONS).meta({ id: 'HistoryAction' });
export type HistoryAction = z.infer<typeof HistoryAction>;

export const HistoryEvent = z
  .object({
    id: z.string(),
    at: Timestamp,
    action: HistoryAction,
    actor: Person.nullable(),
    /** The revision the event is about (issued or in preparation). */
    revision: z.number().int().nullable(),
    /** One line in words, e.g. "Submitted for check to Chandra Patel". */
    summary: z.string(),
    /** The message, reason or note text that went with it. */
    message: z.string().nullable(),
  })
  .meta({ id: 'HistoryEvent' });
export type HistoryEvent = z.infer<typeof HistoryEvent>;

/** `GET /api/sheets/:sheetId/history`: revisions, then every workflow and note event, newest first. */
export const SheetHistoryResponse = z
  .object({ revisions: z.array(RevisionSummary), events: z.array(HistoryEvent) })
  .meta({ id: 'SheetHistoryResponse' });
export type SheetHistoryResponse = z.infer<typeof SheetHistoryResponse>;
