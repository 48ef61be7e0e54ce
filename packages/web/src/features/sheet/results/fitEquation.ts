/**
 * Records on an equation laid out for paper (`.equation-paper`, `.equation-print`) how large its type may be for its
 * widest unbreakable piece to fit the column: `--eq-fit` = font size / width of that piece, a
 * ratio that does not depend on the column's width, so styles/print.css can size the type as
 * `--eq-fit × 100cqi` on any page width. KaTeX breaks a line only between top-level pieces (after
 * a relation or an operator); an aligned block is one piece.
 */
export function fitEquation(element: HTMLElement): void {
  let widest = 0;
  for (const piece of element.querySelectorAll('.katex-html > .katex-base')) widest = Math.max(widest, piece.getBoundingClientRect().width);
  const fontSize = Number.parseFloat(getComputedStyle(element).fontSize);
  if (widest > 0 && fontSize > 0) element.style.setProperty('--eq-fit', (fontSize / widest).toFixed(6));
}

/** While measuring, the paper layout of the editor's equations (hidden on screen) is laid out. */
const MEASURING = 'sheaf-measuring-equations';

/**
 * Fit every equation laid out for paper on the page; called just before printing, when the
 * paper layouts that are hidden on screen can be laid out for a moment and measured.
 */
export function fitEquationsForPrint(root: ParentNode = document): void {
  const html = document.documentElement;
  html.classList.add(MEASURING);
  try {
    root.querySelectorAll<HTMLElement>('.equation-paper, .equation-print').forEach(fitEquation);
  } finally {
    html.classList.remove(MEASURING);
  }
}
