import { useContext, useLayoutEffect, useMemo, useRef } from 'react';
import { SheetEditorContext } from '../sheetEditorContext';
import { fitEquation } from './fitEquation';
import { stackSteps } from './stackSteps';
import { TexView } from './TexView';

const SCREEN = 'equation overflow-x-auto overflow-y-hidden py-0.5 text-[0.9rem] print:overflow-visible';
const PAPER = 'equation equation-paper py-0.5 text-[0.9rem]';

/**
 * A cell's governing equation with its numbers put in. In the editor each row reads left to right
 * on one line (scrolling sideways when it is long). On paper, and in an issued document on
 * screen, the steps of a row stand one under the other (`stackSteps`), a line may break after a
 * relation or an operator, and a piece too wide for its column is set in smaller type
 * (`fitEquation`; `.equation-paper` and, on paper only, `.equation-print` in styles/print.css),
 * so no part of it is cut off.
 */
export function EquationView({ latex, label }: { latex: string; label: string }) {
  const asDocument = useContext(SheetEditorContext)?.asDocument !== undefined;
  const stacked = useMemo(() => stackSteps(latex), [latex]);
  const paper = useRef<HTMLDivElement>(null);
  useLayoutEffect(() => {
    // The document shows the paper layout on screen: fit it now, and again once KaTeX's fonts
    // are in (the editor's is fitted on printing).
    const element = paper.current?.firstElementChild;
    if (!asDocument || !(element instanceof HTMLElement)) return;
    fitEquation(element);
    let live = true;
    void document.fonts?.ready.then(() => live && fitEquation(element));
    return () => {
      live = false;
    };
  }, [asDocument, stacked]);

  if (asDocument) {
    return (
      <div ref={paper}>
        <TexView latex={stacked} display label={label} className={PAPER} />
      </div>
    );
  }
  if (stacked === latex) return <TexView latex={latex} display label={label} className={`${SCREEN} equation-print`} />;
  return (
    <>
      <TexView latex={latex} display label={label} className={`${SCREEN} print:hidden`} />
      <div aria-hidden="true" className="hidden print:block" data-print-equation="">
        <TexView latex={stacked} display className={PAPER} />
      </div>
    </>
  );
}
