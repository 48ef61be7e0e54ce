import { useContext, useMemo } from 'react';
import { SheetEditorContext } from '../sheetEditorContext';
import { equationSteps } from './equationSteps';
import { PaperEquation } from './PaperEquation';
import { TexView } from './TexView';

/**
 * A cell's governing equation with its numbers put in. In the editor each row reads left to right
 * on one line, scrolling sideways when it is long; on paper, and in an issued document on screen,
 * it is laid out as a hand calculation is written, one step per line, wrapped or set smaller
 * where a step is still too wide (PaperEquation), so no part of it is cut off.
 */
export function EquationView({ latex, label }: { latex: string; label: string }) {
  const asDocument = useContext(SheetEditorContext)?.asDocument !== undefined;
  const rows = useMemo(() => equationSteps(latex), [latex]);
  if (asDocument) return <PaperEquation rows={rows} label={label} fitNow />;
  return (
    <>
      <TexView
        latex={latex}
        display
        label={label}
        className="equation overflow-x-auto overflow-y-hidden py-0.5 text-[0.9rem] print:hidden"
      />
      <div aria-hidden="true" className="hidden print:block" data-print-equation="">
        <PaperEquation rows={rows} fitNow={false} />
      </div>
    </>
  );
}
