import { z } from 'zod';
import { Id, Role, SheetStatus, Timestamp } from './common';

/**
 * The check-and-approval workflow of a sheet: draft -> in check -> approved (or back to draft
 * when the checker returns it); an approved revision is superseded once a newer one is approved.
 * Nobody approves a sheet they prepared; only the checker the sheet was submitted to returns or
 * approves it; owners can name another checker.
 */

/** A member as named in the workflow: id and display name. */
export const Person = z.object({ id: Id, name: z.string() }).meta({ id: 'Person' });
export type Person = z.infer<typeof Person>;

/** Who signed a box of the title block (prepared, checked, approved) and when. */
export const Signature = z.object({ user: Person, at: Timestamp }).meta({ id: 'Signature' });
export type Signature = z.infer<typeof Signature>;

export const Signatures = z
  .object({ prepared: Signature.nullable(), checked: Signature.nullable(), approved: Signature.nullable() })
  .meta({ id: 'Signatures' });
export type Signatures = z.infer<typeof Signatures>;

/** A member who may be named as checker (their role allows `sheet.check`). */
export const CheckerCandidate = Person.extend({ role: Role }).meta({ id: 'CheckerCandidate' });
export type CheckerCandidate = z.infer<typeof CheckerCandidate>;

/** What the caller may do to the sheet now: the permission table and the per-sheet rules together. */
export const ReviewAbilities = z
  .object({
    submit: z.boolean(),
    return: z.boolean(),
    approve: z.boolean(),
    reassignChecker: z.boolean(),
    createNotes: z.boolean(),
    resolveNotes: z.boolean(),
  })
  .meta({ id: 'ReviewAbilities' });
export type ReviewAbilities = z.infer<typeof ReviewAbilities>;

/** The checker's message when the sheet was last returned, for the revision in preparation. */
export const ReturnNotice = z.object({ by: Person, at: Timestamp, message: z.string() }).meta({ id: 'ReturnNotice' });
export type ReturnNotice = z.infer<typeof ReturnNotice>;

/** `GET /api/sheets/:sheetId/review`: where the sheet stands in the workflow, as the caller sees it. */
export const ReviewState = z
  .object({
    sheetId: Id,
    status: SheetStatus,
    /** Number of the latest approved revision; 0 before the first is issued. */
    issuedRevision: z.number().int().min(0),
    /** The revision the status is about: the issued one when approved, else the one in preparation. */
    currentRevision: z.number().int().min(1),
    preparer: Person.nullable(),
    checker: Person.nullable(),
    submittedAt: Timestamp.nullable(),
    openNotes: z.number().int().min(0),
    /** Title block signatures of the current revision. */
    signatures: Signatures,
    lastReturn: ReturnNotice.nullable(),
    checkerCandidates: z.array(CheckerCandidate),
    can: ReviewAbilities,
  })
  .meta({ id: 'ReviewState' });
export type ReviewState = z.infer<typeof ReviewState>;

export const ReviewStateResponse = z.object({ review: ReviewState }).meta({ id: 'ReviewStateResponse' });
export type ReviewStateResponse = z.infer<typeof ReviewStateResponse>;

const Message = z.string({ error: 'must be a string' }).trim().max(4000, { error: 'must be at most 4000 characters' });

/** `POST /api/sheets/:sheetId/submit`. */
export const SubmitForCheckRequest = z
  .object({
    checkerUserId: z.uuid({ error: 'must be the id of a member who may check sheets' }),
    message: Message.optional(),
  })
  .meta({ id: 'SubmitForCheckRequest' });
export type SubmitForCheckRequest = z.infer<typeof SubmitForCheckRequest>;

/** `POST /api/sheets/:sheetId/return`: the checker's message says what to fix. */
export const ReturnSheetRequest = z
  .object({ message: Message.min(1, { error: 'must say what the preparer should fix' }) })
  .meta({ id: 'ReturnSheetRequest' });
export type ReturnSheetRequest = z.infer<typeof ReturnSheetRequest>;

/**
 * `POST /api/sheets/:sheetId/approve`. Open notes block approval unless the checker gives a
 * reason to override them (recorded with the revision). Any other field, results included, is
 * ignored: the server computes the revision's results itself.
 */
export const ApproveSheetRequest = z
  .object({
    overrideReason: z
      .string({ error: 'must be a string' })
      .trim()
      .min(1, { error: 'must not be empty' })
      .max(2000, { error: 'must be at most 2000 characters' })
      .optional(),
  })
  .meta({ id: 'ApproveSheetRequest' });
export type ApproveSheetRequest = z.infer<typeof ApproveSheetRequest>;

/** `POST /api/sheets/:sheetId/checker` (owners): name another checker for a sheet in check. */
export const ReassignCheckerRequest = z
  .object({ checkerUserId: z.uuid({ error: 'must be the id of a member who may check sheets' }) })
  .meta({ id: 'ReassignCheckerRequest' });
export type ReassignCheckerRequest = z.infer<typeof ReassignCheckerRequest>;
