import type { FrozenMaterials } from '@sheaf/engine/api';
import { createContext } from 'react';
import type { Awareness } from 'y-protocols/awareness';
import type * as Y from 'yjs';
import type { SheetEvaluatorStore } from './evaluation/sheetEvaluatorStore';
import type { CompletionSheet } from './expression/expressionCompletion';

/** What every part of the sheet editor shares: the document, its results, who is here. */
export interface SheetEditorContextValue {
  doc: Y.Doc;
  store: SheetEvaluatorStore;
  /** Presence of the live connection; null in a preview that is not connected. */
  awareness: Awareness | null;
  /** Checkers, viewers and previews: nothing can be changed, no structure controls are shown. */
  readOnly: boolean;
  /** Live view of the sheet for expression completion. */
  completion: CompletionSheet;
  /** The organization whose materials library the sheet's cells pick from; null while unknown. */
  organizationId?: string | null;
  /**
   * Set when the cells are shown as an issued document rather than edited: every field reads as
   * text (no editors, no selects), and a cell that names a material shows the values frozen with
   * the revision.
   */
  asDocument?: DocumentPresentation;
}

/** How an issued revision's cells are shown. */
export interface DocumentPresentation {
  /** The library materials the revision was issued with, by id, as frozen at approval. */
  materials: FrozenMaterials;
}

export const SheetEditorContext = createContext<SheetEditorContextValue | null>(null);
