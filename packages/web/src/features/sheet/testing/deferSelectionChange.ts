/**
 * happy-dom fires `selectionchange` synchronously inside `Selection.collapse`, where browsers
 * queue it. CodeMirror sets the DOM selection during its own update, so under happy-dom a
 * focused editor would re-enter its update. Tests of the editor queue the event as browsers do.
 */
export function deferSelectionChange(): () => void {
  const original = document.dispatchEvent;
  document.dispatchEvent = function dispatchEvent(this: Document, event: Event) {
    if (event.type !== 'selectionchange') return original.call(this, event);
    setTimeout(() => original.call(this, event), 0);
    return true;
  };
  return () => {
    document.dispatchEvent = original;
  };
}
