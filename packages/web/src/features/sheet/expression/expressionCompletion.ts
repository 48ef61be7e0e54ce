import type { Completion, CompletionContext, CompletionResult } from '@codemirror/autocomplete';
import { FUNCTION_WORDS, UNIT_WORDS } from './vocabulary';

/** What completion needs from the sheet, read when completion runs (never stale). */
export interface CompletionSheet {
  /** Names of the sheet's cells, in order. */
  names(): readonly string[];
  /** The kind of the cell with this name, for the hint beside it. */
  kindOf(name: string): string | undefined;
  /** The values a cell's result holds (`P.` offers `s1`, `p1`, `vonMises`, ...). */
  valuesOf(name: string): readonly string[];
}

const WORD = /[A-Za-z_][A-Za-z0-9_]*/;

/**
 * The completions for the word being typed: after `Name.` the values of that cell's result;
 * otherwise cell names first, then units, then functions (inserted with their opening bracket).
 * Null when there is no word (unless completion was asked for with Ctrl-Space).
 */
export function expressionCompletions(
  sheet: CompletionSheet,
  textBefore: string,
  explicit: boolean,
): { from: number; options: Completion[] } | null {
  const word = new RegExp(`${WORD.source}$`).exec(textBefore);
  const from = word ? textBefore.length - word[0].length : textBefore.length;
  const dotted = /([A-Za-z_][A-Za-z0-9_]*)\.$/.exec(textBefore.slice(0, from));
  if (dotted) {
    const owner = dotted[1]!;
    const values = sheet.valuesOf(owner);
    if (values.length === 0) return null;
    return {
      from,
      options: values.map((key) => ({ label: key, type: 'property', detail: `value of ${owner}` })),
    };
  }
  if (!word && !explicit) return null;
  // A word glued to a number (`2e`) is an exponent being typed, not a name.
  if (word && /[\d.]$/.test(textBefore.slice(0, from))) return null;
  const names = sheet.names();
  const taken = new Set(names);
  const options: Completion[] = [
    ...names.map((name) => ({ label: name, type: 'variable', detail: sheet.kindOf(name) ?? 'cell', boost: 2 })),
    ...UNIT_WORDS.filter((u) => !taken.has(u.label)).map((u) => ({ label: u.label, type: 'constant', detail: u.detail })),
    ...FUNCTION_WORDS.map((f) => ({
      label: f.label,
      type: 'function',
      detail: f.detail,
      apply: `${f.label}(`,
      boost: -1,
    })),
  ];
  return { from, options };
}

/** The CodeMirror completion source over a sheet. */
export function expressionCompletionSource(sheet: CompletionSheet) {
  return (context: CompletionContext): CompletionResult | null => {
    const line = context.state.doc.lineAt(context.pos);
    const before = line.text.slice(0, context.pos - line.from);
    const found = expressionCompletions(sheet, before, context.explicit);
    if (!found) return null;
    return { from: line.from + found.from, options: found.options, validFor: WORD };
  };
}
