import 'katex/dist/katex.min.css';
import './sheetEditor.css';
import type { KindId, MaterialsLookup } from '@sheaf/engine';
import { useCallback, useEffect, useMemo, useState, type FocusEvent, type KeyboardEvent } from 'react';
import type { Awareness } from 'y-protocols/awareness';
import type * as Y from 'yjs';
import { CELL_FIELD, type PresencePeer } from '../../collab/presence';
import { usePeers } from '../../collab/usePeers';
import { AddCellMenu } from './cells/AddCellMenu';
import { CellCard, type CellActions } from './cells/CellCard';
import { useCellDrag } from './cells/useCellDrag';
import { addCell, deleteCell, duplicateCell, moveCellBy, moveCellTo } from './doc/cellActions';
import { completionSheetOf } from './evaluation/completionSheet';
import { useCellOrder } from './hooks/useCellOrder';
import { useCellSummary } from './hooks/useCellSummary';
import { useEvaluator } from './hooks/useEvaluator';
import { useStructureUndo } from './hooks/useStructureUndo';
import { ExportSheetButton } from './manage/ExportSheetButton';
import { PresenceBar } from './PresenceBar';
import { SheetEditorContext, type SheetEditorContextValue } from './sheetEditorContext';
import { SheetSettingsBar } from './SheetSettingsBar';

export interface SheetEditorProps {
  doc: Y.Doc;
  /** Presence of the live connection; null for a preview that is not connected. */
  awareness: Awareness | null;
  /** No changes at all: checkers, viewers, a preview, a connection that ended. */
  readOnly: boolean;
  /** The signed-in person, for the presence bar. */
  selfName: string;
  /** What an exported file is named after (the calc number). */
  fileStem: string;
  /** The sheet's organization, whose materials library the material pickers offer. */
  organizationId?: string | null;
  /** The materials cells that name a material are evaluated with (the organization's library). */
  materials?: MaterialsLookup;
}

const noPeers: readonly PresencePeer[] = [];

/**
 * The sheet's cells, top to bottom, each with its inputs and live result, over the shared
 * document. Results follow every keystroke (here or anyone's) through the engine's incremental
 * evaluation; nothing waits for the server.
 */
export function SheetEditor({ doc, awareness, readOnly, selfName, fileStem, organizationId = null, materials }: SheetEditorProps) {
  const store = useEvaluator(doc);
  useEffect(() => store.setMaterials(materials), [store, materials]);
  const ids = useCellOrder(doc);
  const summary = useCellSummary(store);
  const peers = usePeers(awareness);
  const structureUndo = useStructureUndo(doc);
  const completion = useMemo(() => completionSheetOf(store), [store]);
  const [focusCell, setFocusCell] = useState<string | null>(null);
  const [undoNotice, setUndoNotice] = useState<string | null>(null);

  const context = useMemo<SheetEditorContextValue>(
    () => ({ doc, store, awareness, readOnly, completion, organizationId }),
    [doc, store, awareness, readOnly, completion, organizationId],
  );

  const show = useCallback((id: string) => {
    const element = document.getElementById(`cell-${id}`);
    element?.scrollIntoView({ block: 'center', behavior: 'smooth' });
    element?.querySelector<HTMLElement>('.cm-content, [data-static-field]')?.focus({ preventScroll: true });
  }, []);

  const actions = useMemo<CellActions>(
    () => ({
      move(id, delta) {
        if (moveCellBy(doc, id, delta)) {
          // The card moved in the list; keep the keyboard where the person was.
          requestAnimationFrame(() =>
            document.getElementById(`cell-${id}`)?.querySelector<HTMLElement>('.cm-content, [data-static-field]')?.focus(),
          );
        }
      },
      duplicate(id) {
        const copy = duplicateCell(doc, id);
        if (copy) setFocusCell(copy);
      },
      remove(id) {
        const name = summary.find((cell) => cell.id === id)?.name;
        deleteCell(doc, id);
        setUndoNotice(name ? `Deleted ${name}.` : 'Deleted the cell.');
      },
      insertBelow(id, kind) {
        const index = ids.indexOf(id);
        setFocusCell(addCell(doc, kind, index < 0 ? ids.length : index + 1));
      },
      show,
    }),
    [doc, ids, summary, show],
  );

  const onMove = useCallback((id: string, to: number) => moveCellTo(doc, id, to), [doc]);
  const drag = useCellDrag(ids, onMove);
  const clearFocusRequest = useCallback(() => setFocusCell(null), []);

  const peersByCell = useMemo(() => {
    const map = new Map<string, PresencePeer[]>();
    for (const peer of peers) if (peer.cell) map.set(peer.cell, [...(map.get(peer.cell) ?? []), peer]);
    return map;
  }, [peers]);

  // Tell the others which cell this person is in (awareness field `cell`).
  const onFocus = (event: FocusEvent<HTMLElement>) => {
    const cell = (event.target as Element).closest('[data-cell-id]')?.getAttribute('data-cell-id') ?? null;
    if (awareness && cell && awareness.getLocalState()?.[CELL_FIELD] !== cell) awareness.setLocalStateField(CELL_FIELD, cell);
  };
  const onBlur = (event: FocusEvent<HTMLElement>) => {
    const next = event.relatedTarget as Element | null;
    if (awareness && !next?.closest('[data-cell-id]')) awareness.setLocalStateField(CELL_FIELD, null);
  };
  const onKeyDown = (event: KeyboardEvent<HTMLElement>) => {
    if (readOnly || event.defaultPrevented) return;
    const inEditor = (event.target as Element).closest('.cm-editor, input, textarea, select');
    if (!inEditor && (event.ctrlKey || event.metaKey) && !event.shiftKey && event.key.toLowerCase() === 'z') {
      if (structureUndo.undo()) {
        event.preventDefault();
        setUndoNotice(null);
      }
    }
  };

  return (
    <SheetEditorContext.Provider value={context}>
      <section aria-label="Cells" className="sheet-editor" data-read-only={readOnly ? 'true' : 'false'}>
        <div className="no-print mb-3 flex flex-wrap items-end justify-between gap-x-4 gap-y-2 border-b border-paper-rule pb-3">
          <SheetSettingsBar doc={doc} readOnly={readOnly} />
          <div className="flex items-end gap-2">
            <ExportSheetButton doc={doc} fileStem={fileStem} />
          </div>
        </div>
        {awareness ? (
          <div className="no-print mb-2">
            <PresenceBar peers={peers} cells={summary} selfName={selfName} />
          </div>
        ) : null}

        {undoNotice && !readOnly ? (
          <div role="status" className="no-print mb-2 flex items-center gap-3 bg-paper-sunk px-3 py-1.5 text-[0.875rem]">
            <span>{undoNotice}</span>
            <button
              type="button"
              className="underline"
              onClick={() => {
                structureUndo.undo();
                setUndoNotice(null);
              }}
            >
              Undo
            </button>
            <button type="button" className="ml-auto text-ink-muted" aria-label="Dismiss" onClick={() => setUndoNotice(null)}>
              ✕
            </button>
          </div>
        ) : null}

        {ids.length === 0 ? (
          <p className="py-4 text-ink-muted">This sheet has no cells yet.{readOnly ? '' : ' Add the first one below.'}</p>
        ) : (
          <ol className="border-t border-paper-line" onFocus={onFocus} onBlur={onBlur} onKeyDown={onKeyDown}>
            {ids.map((id, index) => (
              <CellCard
                key={id}
                id={id}
                index={index}
                total={ids.length}
                peers={peersByCell.get(id) ?? noPeers}
                drag={drag}
                actions={actions}
                focusOnMount={focusCell === id}
                onFocused={clearFocusRequest}
              />
            ))}
          </ol>
        )}

        {!readOnly ? (
          <div className="no-print mt-3">
            <AddCellMenu label="Add cell" onAdd={(kind: KindId) => setFocusCell(addCell(doc, kind, ids.length))} />
          </div>
        ) : null}
      </section>
    </SheetEditorContext.Provider>
  );
}
