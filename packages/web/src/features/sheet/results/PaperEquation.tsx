import { Fragment, useLayoutEffect, useRef } from 'react';
import type { EquationRow } from './equationSteps';
import { fitEquationSteps } from './fitEquation';
import { TexView } from './TexView';

/**
 * An equation as a hand calculation sets it on paper: each left-hand side once, and under it, on
 * the right of the equals sign, one step per line (`equationSteps`). Each step is typeset on its
 * own, so it may break after a relation or an operator, and a step with a piece too wide for the
 * column is set in smaller type (`fitEquationSteps`, `.equation-step` in styles/print.css).
 * `fitNow`: measure at once (shown on screen); otherwise the page fits it just before printing.
 */
export function PaperEquation({ rows, label, fitNow }: { rows: readonly EquationRow[]; label?: string; fitNow: boolean }) {
  const box = useRef<HTMLDivElement>(null);
  useLayoutEffect(() => {
    const element = box.current;
    if (!fitNow || !element) return;
    fitEquationSteps(element);
    // Measured again once KaTeX's fonts are in: the fallback font has other widths.
    let live = true;
    void document.fonts?.ready.then(() => live && fitEquationSteps(element));
    return () => {
      live = false;
    };
  }, [fitNow, rows]);

  return (
    <div
      ref={box}
      role={label ? 'group' : undefined}
      aria-label={label}
      className="equation equation-paper grid grid-cols-[max-content_minmax(0,1fr)] items-baseline gap-x-[0.3em] gap-y-1 py-0.5 text-[0.9rem]"
    >
      {rows.map((row, index) =>
        'line' in row ? (
          <div key={index} className="@container col-span-2">
            <TexView latex={`\\displaystyle ${row.line}`} className="equation-step" />
          </div>
        ) : (
          <Fragment key={index}>
            <div className="text-right">
              <TexView latex={`\\displaystyle ${row.lhs}`} />
            </div>
            <div className="@container min-w-0 space-y-1">
              {row.steps.map((step, at) => (
                <div key={at}>
                  <TexView latex={`\\displaystyle = \\nobreak ${step}`} className="equation-step" />
                </div>
              ))}
            </div>
          </Fragment>
        ),
      )}
    </div>
  );
}
