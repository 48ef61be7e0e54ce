import { isKindId, type KindId } from '@sheaf/engine';
import { memo, useEffect, useRef, type KeyboardEvent, type ReactNode } from 'react';
import type { PresencePeer } from '../../../collab/presence';
import { errorFieldOf } from '../fields/errorField';
import { TextValueField } from '../fields/TextValueField';
import { useCellFields } from '../hooks/useCellFields';
import { useCellResult } from '../hooks/useCellResult';
import { useCellSummary } from '../hooks/useCellSummary';
import { useSheetEditor } from '../hooks/useSheetEditor';
import { useSheetSettings } from '../hooks/useSheetSettings';
import { CellOpenNotesBadge } from '../../review/OpenNotesContext';
import { KIND_VIEWS } from '../kinds/kindViews';
import { CellOutcome } from '../results/CellOutcome';
import { AddCellMenu } from './AddCellMenu';
import type { CellDrag } from './useCellDrag';

export interface CellActions {
  move(id: string, delta: number): void;
  duplicate(id: string): void;
  remove(id: string): void;
  insertBelow(id: string, kind: KindId): void;
  show(id: string): void;
}

export interface CellCardProps {
  id: string;
  index: number;
  total: number;
  /** Other people whose cursor is in this cell. */
  peers: readonly PresencePeer[];
  drag: CellDrag;
  actions: CellActions;
  /** Focus the first field when the card mounts (a cell just added). */
  focusOnMount: boolean;
  onFocused(): void;
}

/**
 * One cell of the sheet, read top to bottom like a line of a hand calculation: its number,
 * kind and name; its inputs; the equation with numbers put in and the result; its figure.
 * Writers get the handle and the move, duplicate, insert and delete controls; Alt+↑/↓ on a
 * focused cell moves it. Someone else working in the cell outlines it in their colour.
 */
export const CellCard = memo(function CellCard(props: CellCardProps) {
  const { id, index, total, peers, drag, actions, focusOnMount, onFocused } = props;
  const { doc, store, readOnly } = useSheetEditor();
  const cell = useCellFields(doc, id);
  const result = useCellResult(store, id);
  const summary = useCellSummary(store);
  const { unitSystem } = useSheetSettings(doc);
  const card = useRef<HTMLLIElement>(null);

  useEffect(() => {
    if (!focusOnMount || !cell) return;
    // The first input of the cell's body (its name keeps the name it was given).
    const target = card.current?.querySelector<HTMLElement>(
      '.cell-inputs :is(.cm-content[contenteditable="true"], [data-static-field], select, textarea, button.btn)',
    );
    target?.focus();
    onFocused();
  }, [focusOnMount, cell, onFocused]);

  if (!cell) return null;
  const kind: KindId | null = isKindId(cell.kind) ? cell.kind : null;
  const view = kind ? KIND_VIEWS[kind] : null;
  const cellName = typeof cell.name === 'string' ? cell.name : '';
  const title = kind === 'note' ? `note ${index + 1}` : cellName || `cell ${index + 1}`;
  const errorId = `cell-${id}-error`;
  const errorField = errorFieldOf(result);
  const equation = result?.ok ? store.equation(id, unitSystem) : null;
  const root = result && !result.ok && result.error.rootCellId ? result.error.rootCellId : null;
  const rootLabel = root ? summary.find((c) => c.id === root)?.name || 'the first cell with the error' : undefined;
  const colour = peers[0]?.user.colour;

  const onKeyDown = (event: KeyboardEvent<HTMLLIElement>) => {
    if (readOnly || event.defaultPrevented || !event.altKey || event.ctrlKey || event.metaKey) return;
    if (event.key !== 'ArrowUp' && event.key !== 'ArrowDown') return;
    event.preventDefault();
    actions.move(id, event.key === 'ArrowUp' ? -1 : 1);
  };

  return (
    <li
      ref={card}
      id={`cell-${id}`}
      data-cell-id={id}
      data-kind={cell.kind}
      aria-label={`${index + 1}. ${view?.label ?? cell.kind} ${kind === 'note' ? '' : cellName}`.trim()}
      onKeyDown={onKeyDown}
      {...drag.targetProps(index)}
      className={`cell-card relative grid grid-cols-[2.25rem_minmax(0,1fr)] gap-x-2 border-b border-paper-line py-3 break-inside-avoid ${
        drag.dragging === id ? 'opacity-50' : ''
      }`}
      style={colour ? { boxShadow: `inset 3px 0 0 ${colour}, 0 0 0 2px ${colour}` } : undefined}
    >
      {drag.dropIndex === index ? <DropLine edge="top" /> : null}
      {drag.dropIndex === index + 1 && index === total - 1 ? <DropLine edge="bottom" /> : null}

      <div className="flex flex-col items-end gap-1 pt-0.5">
        <span className="font-mono text-[0.8125rem] text-ink-faint">{index + 1}</span>
        {!readOnly ? (
          <button
            type="button"
            className="no-print cursor-grab px-1 text-ink-faint hover:text-ink active:cursor-grabbing"
            aria-label={`Drag to move ${title}; or focus the cell and press Alt+Arrow up or down`}
            title="Drag to move; Alt+↑/↓ moves a focused cell"
            {...drag.handleProps(id)}
          >
            <svg width="10" height="16" viewBox="0 0 10 16" aria-hidden="true">
              {[3, 8, 13].map((y) => (
                <g key={y}>
                  <circle cx="2.5" cy={y} r="1.3" fill="currentColor" />
                  <circle cx="7.5" cy={y} r="1.3" fill="currentColor" />
                </g>
              ))}
            </svg>
          </button>
        ) : null}
      </div>

      <div className="@container min-w-0">
        <header className="mb-2 flex flex-wrap items-center gap-x-2 gap-y-1">
          <span className="rounded-[2px] border border-paper-rule px-1.5 text-[0.6875rem] font-medium tracking-[0.06em] text-ink-muted uppercase">
            {view?.label ?? cell.kind}
          </span>
          {kind !== 'note' ? (
            <TextValueField
              cellId={id}
              field="name"
              label={`name of ${view?.label.toLowerCase() ?? 'cell'} ${index + 1}`}
              placeholder="name"
              className="cell-name w-[9rem] font-semibold"
              invalid={errorField === 'name' || result?.ok === false && result.error.code === 'duplicate-name'}
              describedBy={errorId}
            />
          ) : null}
          <CellOpenNotesBadge cellId={id} cellLabel={title} />
          {peers.length > 0 ? (
            <span className="text-[0.75rem]" data-peers>
              {peers.map((peer) => (
                <span key={peer.clientId} className="mr-1.5 inline-flex items-center gap-1" style={{ color: peer.user.colour }}>
                  <span aria-hidden="true" className="inline-block h-2 w-2 rounded-full" style={{ background: peer.user.colour }} />
                  <span className="text-ink-muted">{peer.user.name} is here</span>
                </span>
              ))}
            </span>
          ) : null}
          {!readOnly ? (
            <span className="no-print ml-auto flex items-center gap-1" role="group" aria-label={`Actions on ${title}`}>
              <IconButton label={`Move ${title} up`} disabled={index === 0} onClick={() => actions.move(id, -1)} glyph="↑" />
              <IconButton label={`Move ${title} down`} disabled={index === total - 1} onClick={() => actions.move(id, 1)} glyph="↓" />
              <IconButton label={`Duplicate ${title}`} onClick={() => actions.duplicate(id)} glyph={<DuplicateGlyph />} />
              <AddCellMenu label="Insert below" compact onAdd={(k) => actions.insertBelow(id, k)} />
              <IconButton label={`Delete ${title}`} onClick={() => actions.remove(id)} glyph="✕" danger />
            </span>
          ) : null}
        </header>

        <div className={view?.Figure ? 'cell-layout grid gap-x-5 gap-y-3 @min-[62rem]:grid-cols-[minmax(0,1fr)_minmax(0,26rem)] print:grid-cols-[minmax(0,1fr)_minmax(0,24rem)]' : ''}>
          <div className="cell-inputs @container min-w-0 space-y-1.5">
            {view ? (
              <view.Inputs cell={cell} cellName={cellName} result={result} errorField={errorField} errorId={errorId} />
            ) : (
              <p className="text-ink-muted">This version has no editor for cells of kind “{cell.kind}”.</p>
            )}
            {kind !== 'note' ? (
              <div className="pt-1.5">
                <CellOutcome
                  result={result}
                  equation={equation}
                  system={unitSystem}
                  cellName={cellName}
                  errorId={errorId}
                  rootLabel={rootLabel}
                  onShowRoot={root ? () => actions.show(root) : undefined}
                />
              </div>
            ) : null}
          </div>
          {view?.Figure ? (
            <div className="min-w-0 max-w-[34rem]">
              <view.Figure cell={cell} cellName={cellName} result={result} errorField={errorField} errorId={errorId} />
            </div>
          ) : null}
        </div>
      </div>
    </li>
  );
});

function IconButton({
  label,
  glyph,
  onClick,
  disabled = false,
  danger = false,
}: {
  label: string;
  glyph: ReactNode;
  onClick(): void;
  disabled?: boolean;
  danger?: boolean;
}) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      disabled={disabled}
      onClick={onClick}
      className={`btn h-7 w-7 justify-center px-0 py-0 text-[0.875rem] leading-none ${danger ? 'text-fail' : ''}`}
    >
      <span aria-hidden="true">{glyph}</span>
    </button>
  );
}

function DuplicateGlyph() {
  return (
    <svg width="13" height="13" viewBox="0 0 13 13" fill="none" stroke="currentColor" strokeWidth="1.3">
      <rect x="0.65" y="3.65" width="8.7" height="8.7" rx="1" />
      <path d="M3.65 3.6V1.65a1 1 0 0 1 1-1h6.7a1 1 0 0 1 1 1v6.7a1 1 0 0 1-1 1H9.4" />
    </svg>
  );
}

function DropLine({ edge }: { edge: 'top' | 'bottom' }) {
  return (
    <span
      aria-hidden="true"
      className={`pointer-events-none absolute right-0 left-0 h-[3px] bg-accent ${edge === 'top' ? '-top-[2px]' : '-bottom-[2px]'}`}
    />
  );
}
