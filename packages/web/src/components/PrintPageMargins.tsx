/** Text for the margins of every printed page; `{page}` and `{pages}` become the page numbers. */
export interface PageMarginText {
  topLeft?: string;
  topCenter?: string;
  topRight?: string;
  bottomLeft?: string;
  bottomRight?: string;
}

const BOXES: Record<keyof PageMarginText, string> = {
  topLeft: 'top-left',
  topCenter: 'top-center',
  topRight: 'top-right',
  bottomLeft: 'bottom-left',
  bottomRight: 'bottom-right',
};

/**
 * Writes the text of the page margins of the printed page (CSS page-margin boxes): e.g. the calc
 * number and content hash at the foot of every page and "Page 2 of 5". Only while it is mounted.
 */
export function PrintPageMargins(text: PageMarginText) {
  const rules = (Object.keys(BOXES) as (keyof PageMarginText)[])
    .filter((box) => text[box])
    .map((box) => `@${BOXES[box]} { content: ${cssContent(text[box]!)}; ${box === 'topCenter' ? EMPHASIS : PLAIN} }`)
    .join(' ');
  return <style data-print-margins="">{`@media print { @page { ${rules} } }`}</style>;
}

const PLAIN = "font: 7.5pt 'IBM Plex Sans', sans-serif; color: #444;";
const EMPHASIS = "font: 600 9pt 'IBM Plex Sans', sans-serif; letter-spacing: 0.08em; color: #000;";

/**
 * A CSS `content` value: the text as a string (every character outside plain letters, digits and
 * a few signs escaped, so no text can end the rule), with `{page}` and `{pages}` as counters.
 */
export function cssContent(text: string): string {
  return text
    .split(/(\{page\}|\{pages\})/)
    .filter((part) => part !== '')
    .map((part) => (part === '{page}' ? 'counter(page)' : part === '{pages}' ? 'counter(pages)' : cssString(part)))
    .join(' ');
}

function cssString(text: string): string {
  let out = '"';
  for (const char of text) {
    out += /^[A-Za-z0-9 .,:·\-–—()]$/.test(char) ? char : `\\${char.codePointAt(0)!.toString(16)} `;
  }
  return `${out}"`;
}
