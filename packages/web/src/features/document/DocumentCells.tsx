import '../sheet/sheetEditor.css';
import './calcDocument.css';
import 'katex/dist/katex.min.css';
import { docFromSheetContent, type SheetFileContent } from '@sheaf/sheet-doc';
import type { RevisionDetail } from '@sheaf/engine/api';
import { useMemo } from 'react';
import type { PresencePeer } from '../../collab/presence';
import { CellCard, type CellActions } from '../sheet/cells/CellCard';
import { useCellDrag } from '../sheet/cells/useCellDrag';
import { completionSheetOf } from '../sheet/evaluation/completionSheet';
import { SheetEditorContext, type SheetEditorContextValue } from '../sheet/sheetEditorContext';
import { createIssuedEvaluatorStore } from './issuedEvaluatorStore';
import type { IssuedResults } from './issuedResults';

const noPeers: readonly PresencePeer[] = [];
const nothing = () => {};
const focusNothing = () => {};

/**
 * The cells of an issued revision, drawn by the sheet editor's own cell cards over a copy of the
 * frozen content, read-only, with the issued results: inputs with units, the governing equation
 * with the numbers put in, the values, the verdicts and the figures, exactly as the live sheet
 * draws them, but with every field as text and the materials as frozen.
 */
export function DocumentCells({ revision, issued }: { revision: Pick<RevisionDetail, 'content' | 'materials'>; issued: IssuedResults }) {
  const doc = useMemo(() => docFromSheetContent(revision.content as SheetFileContent), [revision.content]);
  const store = useMemo(() => createIssuedEvaluatorStore(issued), [issued]);
  const ids = useMemo(() => revision.content.cells.map((cell) => cell.id), [revision.content.cells]);
  const context = useMemo<SheetEditorContextValue>(
    () => ({
      doc,
      store,
      awareness: null,
      readOnly: true,
      completion: completionSheetOf(store),
      organizationId: null,
      asDocument: { materials: revision.materials ?? {} },
    }),
    [doc, store, revision.materials],
  );
  const drag = useCellDrag(ids, nothing);
  const actions = useMemo<CellActions>(
    () => ({
      move: nothing,
      duplicate: nothing,
      remove: nothing,
      insertBelow: nothing,
      show(id) {
        document.getElementById(`cell-${id}`)?.scrollIntoView({ block: 'center', behavior: 'smooth' });
      },
    }),
    [],
  );

  if (ids.length === 0) return <p className="py-4 text-ink-muted">This revision has no cells.</p>;
  return (
    <SheetEditorContext.Provider value={context}>
      <section aria-label="Cells" className="sheet-editor calc-document" data-read-only="true">
        <ol className="border-t border-paper-line">
          {ids.map((id, index) => (
            <CellCard
              key={id}
              id={id}
              index={index}
              total={ids.length}
              peers={noPeers}
              drag={drag}
              actions={actions}
              focusOnMount={false}
              onFocused={focusNothing}
            />
          ))}
        </ol>
      </section>
    </SheetEditorContext.Provider>
  );
}
