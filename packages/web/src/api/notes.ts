import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { NoteListResponse, NoteThread, NoteThreadResponse } from '@sheaf/engine/api';
import { apiRequest } from './client';
import { reviewKeys } from './review';

const enc = encodeURIComponent;

/** GET /api/sheets/:sheetId/notes[?revision=N]: note threads, oldest first. */
export function useNoteThreads(sheetId: string, revision?: number) {
  return useQuery({
    queryKey: reviewKeys.notes(sheetId, revision),
    queryFn: ({ signal }) =>
      apiRequest<NoteListResponse>(
        `/api/sheets/${enc(sheetId)}/notes${revision === undefined ? '' : `?revision=${revision}`}`,
        { signal },
      ).then((r) => r.threads),
  });
}

/** Notes change the open count of the workflow state and the history: refresh them together. */
function useNotesChanged(sheetId: string) {
  const queryClient = useQueryClient();
  return (thread: NoteThread) => {
    queryClient.setQueryData<NoteThread[]>(reviewKeys.notes(sheetId), (old) =>
      old === undefined
        ? old
        : old.some((t) => t.id === thread.id)
          ? old.map((t) => (t.id === thread.id ? thread : t))
          : [...old, thread],
    );
    return queryClient.invalidateQueries({ queryKey: reviewKeys.ofSheet(sheetId) });
  };
}

/** POST /api/sheets/:sheetId/notes: a new thread on a cell, or a reply (`parentId`). */
export function useCreateNote(sheetId: string) {
  const changed = useNotesChanged(sheetId);
  return useMutation({
    mutationFn: (input: { cellId: string; body: string; parentId?: string }) =>
      apiRequest<NoteThreadResponse>(`/api/sheets/${enc(sheetId)}/notes`, { method: 'POST', body: input }).then(
        (r) => r.thread,
      ),
    onSuccess: changed,
  });
}

/** POST /api/sheets/:sheetId/notes/:noteId/resolve or /reopen. */
export function useSetThreadResolved(sheetId: string) {
  const changed = useNotesChanged(sheetId);
  return useMutation({
    mutationFn: (input: { threadId: string; resolved: boolean }) =>
      apiRequest<NoteThreadResponse>(
        `/api/sheets/${enc(sheetId)}/notes/${enc(input.threadId)}/${input.resolved ? 'resolve' : 'reopen'}`,
        { method: 'POST' },
      ).then((r) => r.thread),
    onSuccess: changed,
  });
}
