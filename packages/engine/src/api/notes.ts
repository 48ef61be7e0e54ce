import { z } from 'zod';
import { Id, Timestamp } from './common';
import { Person } from './review';

/**
 * Notes on a sheet: each belongs to one cell (by the cell's stable id), records the revision it
 * was made on, and opens a thread that others answer. A thread is resolved or reopened as a
 * whole; open threads block approval unless the checker overrides with a reason.
 */

export const Note = z
  .object({
    id: Id,
    cellId: z.string(),
    author: Person,
    body: z.string(),
    /** The revision the sheet was at (issued, or in preparation) when the note was written. */
    revision: z.number().int().min(1),
    createdAt: Timestamp,
    /** Members named with @name in the body; each was sent an e-mail. */
    mentions: z.array(Person),
  })
  .meta({ id: 'Note' });
export type Note = z.infer<typeof Note>;

export const NoteThread = Note.extend({
  status: z.enum(['open', 'resolved']),
  resolvedAt: Timestamp.nullable(),
  resolvedBy: Person.nullable(),
  replies: z.array(Note),
}).meta({ id: 'NoteThread' });
export type NoteThread = z.infer<typeof NoteThread>;

/** `GET /api/sheets/:sheetId/notes?revision=N`: every thread, or those made on revision N. */
export const NotesQuery = z.object({
  revision: z.coerce.number({ error: 'must be a revision number' }).int().min(1).optional(),
});
export type NotesQuery = z.infer<typeof NotesQuery>;

export const NoteListResponse = z.object({ threads: z.array(NoteThread) }).meta({ id: 'NoteListResponse' });
export type NoteListResponse = z.infer<typeof NoteListResponse>;

/** `POST /api/sheets/:sheetId/notes`: a new thread on a cell, or (with `parentId`) a reply. */
export const CreateNoteRequest = z
  .object({
    cellId: z.string({ error: 'must be the id of a cell of this sheet' }).min(1, { error: 'must not be empty' }).max(64),
    body: z
      .string({ error: 'must be a string' })
      .trim()
      .min(1, { error: 'must not be empty' })
      .max(4000, { error: 'must be at most 4000 characters' }),
    parentId: Id.optional(),
  })
  .meta({ id: 'CreateNoteRequest' });
export type CreateNoteRequest = z.infer<typeof CreateNoteRequest>;

/** The thread a note belongs to, after creating, resolving or reopening. */
export const NoteThreadResponse = z.object({ thread: NoteThread }).meta({ id: 'NoteThreadResponse' });
export type NoteThreadResponse = z.infer<typeof NoteThreadResponse>;
