import { EditorView } from '@codemirror/view';

/**
 * The look of expression fields: the mono face on white, a hairline box like the other inputs,
 * the accent ring only when focused, unknown names underlined wavy in the fail colour (a
 * shape, not colour alone) and cell names in semibold.
 */
export const expressionTheme = EditorView.theme({
  '&': {
    backgroundColor: '#fff',
    color: 'var(--color-ink)',
    border: '1px solid var(--color-paper-rule)',
    borderRadius: '3px',
    fontSize: '0.9375rem',
  },
  '&.cm-focused': {
    outline: '2px solid var(--color-accent)',
    outlineOffset: '1px',
  },
  '.cm-scroller': {
    fontFamily: 'var(--font-mono)',
    lineHeight: '1.5',
  },
  '.cm-content': { padding: '3px 0' },
  '.cm-line': { padding: '0 6px' },
  '.cm-placeholder': { color: 'var(--color-ink-faint)' },
  '.cm-unknown-name': {
    textDecoration: 'underline wavy var(--color-fail)',
    textDecorationSkipInk: 'none',
    textUnderlineOffset: '3px',
  },
  '.cm-cell-ref': { fontWeight: '600' },
  '&[data-readonly="true"]': { backgroundColor: 'var(--color-paper-sunk)' },
  '.cm-tooltip-autocomplete': { fontFamily: 'var(--font-mono)' },
  '.cm-tooltip.cm-tooltip-autocomplete > ul > li[aria-selected]': {
    backgroundColor: 'var(--color-accent-soft)',
    color: 'var(--color-ink)',
  },
  '.cm-completionDetail': { color: 'var(--color-ink-muted)', fontFamily: 'var(--font-sans)', fontStyle: 'normal', marginLeft: '0.75em' },
});
