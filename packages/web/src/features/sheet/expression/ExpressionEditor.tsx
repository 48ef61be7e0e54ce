import { autocompletion, completionKeymap } from '@codemirror/autocomplete';
import { defaultKeymap } from '@codemirror/commands';
import { Annotation, Compartment, EditorState, type Extension } from '@codemirror/state';
import { EditorView, keymap, placeholder as placeholderText } from '@codemirror/view';
import { useEffect, useRef, useState } from 'react';
import { yCollab, yUndoManagerKeymap } from 'y-codemirror.next';
import type { Awareness } from 'y-protocols/awareness';
import * as Y from 'yjs';
import { editorAwareness } from '../../../collab/editorAwareness';
import { queueEditor } from './editorQueue';
import { expressionCompletionSource, type CompletionSheet } from './expressionCompletion';
import { expressionTheme } from './expressionTheme';
import { nameHighlight, setCellNames } from './nameHighlight';
import { singleLine } from './singleLine';
import { StaticExpression } from './StaticExpression';

/**
 * Where an editor's text lives: a Y.Text of the document (co-edited character by character,
 * with the person's own undo), or a plain value written back whole (fields nested in a JSON
 * value, like `strength.Sy`, which the layout keeps plain).
 */
export type EditorBinding =
  | { kind: 'shared'; text: Y.Text; awareness: Awareness | null }
  | { kind: 'plain'; value: string; onChange: (value: string) => void; undo?: PlainUndo };

/** Undo for a plain field: the person's own writes to it, kept by a Y.UndoManager. */
export interface PlainUndo {
  undo(): void;
  redo(): void;
}

export interface ExpressionEditorProps {
  binding: EditorBinding;
  /** `expression`: one line, completion, name marking; `name`: one line; `prose`: wrapped text. */
  variant: 'expression' | 'name' | 'prose';
  /** Accessible name of the field, e.g. "σx of S". */
  label: string;
  readOnly: boolean;
  /** Names of the sheet's cells now (marking and completion). */
  names?: ReadonlySet<string>;
  /** Live view of the sheet for completion (stable object). */
  sheet?: CompletionSheet;
  placeholder?: string;
  invalid?: boolean;
  /** Id of the element that explains the field's error. */
  describedBy?: string;
}

const noNames: ReadonlySet<string> = new Set();
const fromOutside = Annotation.define<boolean>();

// Alt+Arrow moves the whole cell (handled by the cell), not a line of a one-line field.
const editingKeys = defaultKeymap.filter((binding) => !/^(Shift-)?Alt-Arrow(Up|Down)$/.test(binding.key ?? ''));

/**
 * A CodeMirror 6 field for one cell field. Shared fields use y-codemirror.next's `yCollab` with
 * a Y.UndoManager, so Ctrl-Z undoes this person's typing only; CodeMirror's own history is left
 * out on purpose. Read-only seats get a read-only editor (`readOnly`, not `editable`) on live
 * shared fields, where it shows the carets of the people typing, and plain text elsewhere. Every
 * field shows its text at once; editors are built a few per frame (see `editorQueue`), or at
 * once when a writer clicks or tabs into the field.
 */
export function ExpressionEditor(props: ExpressionEditorProps) {
  const { binding, variant, label, readOnly, names = noNames, sheet, placeholder, invalid, describedBy } = props;
  const host = useRef<HTMLDivElement>(null);
  const view = useRef<EditorView | null>(null);
  const attributes = useRef(new Compartment());
  const onChange = useRef<(value: string) => void>(() => {});
  const latestNames = useRef(names);
  const latestValue = useRef('');
  // A field that turns from plain into shared text (its first character typed) gets a new editor;
  // the caret moves over to it.
  const hadFocus = useRef(false);
  const buildNow = useRef<() => void>(() => {});
  const [built, setBuilt] = useState<EditorView | null>(null);

  const shared = binding.kind === 'shared' ? binding.text : null;
  const awareness = binding.kind === 'shared' ? binding.awareness : null;
  const plainUndo = binding.kind === 'plain' ? binding.undo : undefined;
  const plainValue = binding.kind === 'plain' ? binding.value : null;
  const plainOnChange = binding.kind === 'plain' ? binding.onChange : null;
  // Read-only seats see others' carets in a live shared field, so they get a read-only editor
  // there; anywhere else there is nothing an editor would add.
  const staticOnly = readOnly && !(shared && awareness);

  useEffect(() => {
    if (plainOnChange) onChange.current = plainOnChange;
  }, [plainOnChange]);

  useEffect(() => {
    latestNames.current = names;
    view.current?.dispatch({ effects: setCellNames.of(names) });
  }, [names]);

  // The editor is built once per binding; later prop changes reach it through effects.
  useEffect(() => {
    const parent = host.current;
    if (!parent || staticOnly) return;
    let created: EditorView | null = null;
    let undoManager: Y.UndoManager | null = null;
    const build = (focus: boolean) => {
      if (created) return;
      ({ created, undoManager } = buildEditor(parent));
      view.current = created;
      setBuilt(created);
      if (focus || hadFocus.current) {
        hadFocus.current = false;
        // The host is still hidden until React re-renders, and a hidden editor cannot take focus.
        parent.hidden = false;
        created.focus();
        created.dispatch({ selection: { anchor: created.state.doc.length } });
      }
    };
    const cancel = hadFocus.current ? null : queueEditor(() => build(false));
    if (!cancel) setTimeout(() => build(true), 0);
    buildNow.current = () => {
      cancel?.();
      build(true);
    };
    return () => {
      cancel?.();
      buildNow.current = () => {};
      if (created) {
        hadFocus.current = created.hasFocus;
        created.destroy();
      }
      undoManager?.destroy();
      view.current = null;
      setBuilt(null);
    };
    // plainValue is the starting text only; later values arrive through the effect below.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [shared, awareness, readOnly, staticOnly, variant, sheet, placeholder, plainUndo]);

  /** The editor itself, with the extensions of its variant and binding. */
  function buildEditor(parent: HTMLElement): { created: EditorView; undoManager: Y.UndoManager | null } {
    const extensions: Extension[] = [
      expressionTheme,
      EditorState.readOnly.of(readOnly),
      EditorView.editable.of(!readOnly),
      EditorView.editorAttributes.of(readOnly ? { 'data-readonly': 'true' } : {}),
      attributes.current.of([]),
      keymap.of(editingKeys),
    ];
    if (variant === 'prose') extensions.push(EditorView.lineWrapping);
    else extensions.push(singleLine());
    if (variant === 'expression') {
      extensions.push(nameHighlight(latestNames.current));
      if (sheet && !readOnly) {
        extensions.push(
          autocompletion({ override: [expressionCompletionSource(sheet)], icons: false }),
          keymap.of(completionKeymap),
        );
      }
    }
    if (placeholder && !readOnly) extensions.push(placeholderText(placeholder));

    let undoManager: Y.UndoManager | null = null;
    let initial: string;
    if (shared) {
      undoManager = new Y.UndoManager(shared);
      extensions.push(
        yCollab(shared, awareness ? editorAwareness(awareness) : null, { undoManager }),
        keymap.of(yUndoManagerKeymap),
      );
      initial = shared.toString();
    } else {
      initial = latestValue.current;
      extensions.push(
        EditorView.updateListener.of((update) => {
          if (!update.docChanged) return;
          if (update.transactions.some((tr) => tr.annotation(fromOutside))) return;
          onChange.current(update.state.doc.toString());
        }),
      );
      if (plainUndo) {
        extensions.push(
          keymap.of([
            { key: 'Mod-z', run: () => (plainUndo.undo(), true), preventDefault: true },
            { key: 'Mod-y', run: () => (plainUndo.redo(), true), preventDefault: true },
            { key: 'Mod-Shift-z', run: () => (plainUndo.redo(), true), preventDefault: true },
          ]),
        );
      }
    }
    const created = new EditorView({ parent, state: EditorState.create({ doc: initial, extensions }) });
    return { created, undoManager };
  }

  // A plain field changed by someone else (or by an undo): show the new value.
  useEffect(() => {
    latestValue.current = plainValue ?? '';
    const current = view.current;
    if (!current || plainValue === null) return;
    const text = current.state.doc.toString();
    if (text === plainValue) return;
    current.dispatch({
      changes: { from: 0, to: text.length, insert: plainValue },
      annotations: fromOutside.of(true),
    });
  }, [plainValue]);

  useEffect(() => {
    const current = view.current;
    if (!current) return;
    const aria: Record<string, string> = { 'aria-label': label };
    if (invalid) aria['aria-invalid'] = 'true';
    if (describedBy) aria['aria-describedby'] = describedBy;
    if (readOnly) aria['aria-readonly'] = 'true';
    if (variant !== 'prose') aria['aria-multiline'] = 'false';
    current.dispatch({ effects: attributes.current.reconfigure(EditorView.contentAttributes.of(aria)) });
  }, [label, invalid, describedBy, readOnly, variant, built]);

  const text = shared ? shared.toString() : (plainValue ?? '');
  if (staticOnly) {
    return (
      <StaticExpression text={text} variant={variant} names={names} label={label} readOnly invalid={invalid} describedBy={describedBy} />
    );
  }
  const ready = built !== null;
  return (
    <div className="min-w-0" data-invalid={invalid ? 'true' : undefined} data-variant={variant}>
      {!ready ? (
        <StaticExpression
          text={text}
          variant={variant}
          names={names}
          label={label}
          readOnly={readOnly}
          invalid={invalid}
          describedBy={describedBy}
          placeholder={placeholder}
          onActivate={readOnly ? undefined : () => buildNow.current()}
        />
      ) : null}
      <div ref={host} className="expression-editor min-w-0" hidden={!ready} />
    </div>
  );
}
