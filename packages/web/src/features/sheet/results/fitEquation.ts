/**
 * Steps wider than this many rem at their full size are too wide for the column beside a figure
 * on paper (about 21rem of an A4 or Letter page; a step up to a third wider is set in smaller
 * type): the cell is then printed with its figure under its equations (`data-wide` in
 * styles/print.css), where the column is twice as wide.
 */
const WIDE_STEP_REM = 28;

/**
 * Records on each step of an equation laid out for paper (`.equation-step`, see PaperEquation) how
 * large its type may be for its widest unbreakable piece to fit its column: `--eq-fit` = font size
 * / width of that piece. The ratio does not depend on the column's width, so styles/print.css can
 * size the type as `--eq-fit × 100cqi` on screen and on any paper width. KaTeX breaks a line only
 * between top-level pieces (after a relation or an operator), so only the widest piece matters.
 * An equation with a step wider than `WIDE_STEP_REM` at full size is marked `data-wide`. `root`
 * is an equation or holds some.
 */
export function fitEquationSteps(root: ParentNode): void {
  const rootPx = Number.parseFloat(getComputedStyle(document.documentElement).fontSize) || 16;
  const equations = [...root.querySelectorAll<HTMLElement>('.equation-paper')];
  if (root instanceof HTMLElement && root.matches('.equation-paper')) equations.push(root);
  for (const equation of equations) {
    let wide = false;
    for (const step of equation.querySelectorAll<HTMLElement>('.equation-step')) {
      let widest = 0;
      for (const piece of step.querySelectorAll('.katex-html > .katex-base')) widest = Math.max(widest, piece.getBoundingClientRect().width);
      const fontPx = Number.parseFloat(getComputedStyle(step).fontSize);
      const fullPx = Number.parseFloat(getComputedStyle(step.parentElement ?? step).fontSize);
      if (!(widest > 0 && fontPx > 0)) continue;
      step.style.setProperty('--eq-fit', (fontPx / widest).toFixed(6));
      if ((widest * fullPx) / fontPx / rootPx > WIDE_STEP_REM) wide = true;
    }
    equation.toggleAttribute('data-wide', wide);
  }
}

/** While measuring, the paper layouts of the editor's equations (hidden on screen) are laid out. */
const MEASURING = 'sheaf-measuring-equations';

/**
 * Fit every equation laid out for paper on the page; called just before printing, when the
 * paper layouts that are hidden on screen can be laid out for a moment and measured.
 */
export function fitEquationsForPrint(root: ParentNode = document): void {
  const html = document.documentElement;
  html.classList.add(MEASURING);
  try {
    fitEquationSteps(root);
  } finally {
    html.classList.remove(MEASURING);
  }
}
