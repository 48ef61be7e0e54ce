import { useEffect, useRef, useState } from 'react';
import { setTextField } from '../doc/fieldWrites';
import { ExpressionEditor, type EditorBinding } from '../expression/ExpressionEditor';
import { useCellText } from '../hooks/useCellText';
import { useSheetEditor } from '../hooks/useSheetEditor';
import { NoteMarkdown } from '../notes/NoteMarkdown';
import type { KindViewProps } from './kindView';

/**
 * A note: Markdown with `$...$` math, shown typeset. Writers edit the source in place (the
 * typeset text follows as they type); an empty note opens ready for typing.
 */
export function NoteInputs({ cell }: KindViewProps) {
  const { doc, awareness, readOnly } = useSheetEditor();
  const text = useCellText(doc, cell.id, 'text');
  const source = typeof cell.text === 'string' ? cell.text : '';
  const [editing, setEditing] = useState(false);
  const box = useRef<HTMLDivElement>(null);
  const open = !readOnly && (editing || source === '');

  useEffect(() => {
    if (editing) box.current?.querySelector<HTMLElement>('.cm-content, [data-static-field]')?.focus();
  }, [editing]);

  if (!open) {
    return (
      <div className="group relative">
        {source === '' ? <p className="text-ink-faint">Empty note.</p> : <NoteMarkdown text={source} />}
        {!readOnly ? (
          <button
            type="button"
            className="no-print btn mt-1 px-2 py-0.5 text-[0.8125rem]"
            onClick={() => setEditing(true)}
          >
            Edit note
          </button>
        ) : null}
      </div>
    );
  }

  const binding: EditorBinding = text
    ? { kind: 'shared', text, awareness }
    : { kind: 'plain', value: '', onChange: (value) => setTextField(doc, cell.id, 'text', value) };
  return (
    <div
      ref={box}
      onBlur={(event) => {
        if (!event.currentTarget.contains(event.relatedTarget as Node | null)) setEditing(false);
      }}
    >
      <ExpressionEditor
        binding={binding}
        variant="prose"
        label="Note text (Markdown, math between $ signs)"
        readOnly={readOnly}
        placeholder="Markdown; math between $ signs, e.g. $F = 18\,kN$"
      />
      {source !== '' ? (
        <div className="mt-2 border-l-2 border-paper-line pl-3" aria-label="Note as it reads">
          <NoteMarkdown text={source} />
        </div>
      ) : null}
      <button type="button" className="no-print btn mt-1 px-2 py-0.5 text-[0.8125rem]" onClick={() => setEditing(false)}>
        Done
      </button>
    </div>
  );
}
