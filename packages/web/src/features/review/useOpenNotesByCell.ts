import { useMemo } from 'react';
import { useNoteThreads } from '../../api/notes';

/**
 * Open note threads per cell id, for the badge on each cell. The sheet editor calls this once
 * and passes each cell its count; it shares the notes query with the notes rail.
 */
export function useOpenNotesByCell(sheetId: string): ReadonlyMap<string, number> {
  const threads = useNoteThreads(sheetId);
  return useMemo(() => {
    const counts = new Map<string, number>();
    for (const thread of threads.data ?? []) {
      if (thread.status === 'open') counts.set(thread.cellId, (counts.get(thread.cellId) ?? 0) + 1);
    }
    return counts;
  }, [threads.data]);
}
