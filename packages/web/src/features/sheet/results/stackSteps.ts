const ALIGNED_START = '\\begin{aligned}';
const ALIGNED_END = '\\end{aligned}';

/**
 * An equation laid out for paper: in an `aligned` block, each row `lhs &= a = b = c` becomes one
 * step per line, `lhs &= a \\ &= b \\ &= c`, aligned on the equals sign, as a hand calculation
 * is written. On screen the chain reads left to right on one line; a page is too narrow for it,
 * and KaTeX cannot break a line inside an aligned block. Only equals signs at the top level of a
 * row are steps (not those inside braces, `\left…\right` or a nested environment). Any other
 * equation is returned unchanged (KaTeX lets it break after a relation or an operator).
 * @example stackSteps('\\begin{aligned}n &= \\frac{S_y}{\\sigma} = \\frac{250}{125} = 2\\end{aligned}')
 *   // '\\begin{aligned}n &= \\frac{S_y}{\\sigma} \\\\ &= \\frac{250}{125} \\\\ &= 2\\end{aligned}'
 */
export function stackSteps(latex: string): string {
  const trimmed = latex.trim();
  if (!trimmed.startsWith(ALIGNED_START) || !trimmed.endsWith(ALIGNED_END)) return latex;
  const body = trimmed.slice(ALIGNED_START.length, trimmed.length - ALIGNED_END.length);
  const rows = topLevelRows(body);
  if (rows === null) return latex;
  const stacked = rows.map(stackRow);
  if (stacked.every((row, index) => row === rows[index])) return latex;
  return `${ALIGNED_START}${stacked.join(' \\\\ ')}${ALIGNED_END}`;
}

/** `lhs &= a = b` → `lhs &= a \\ &= b`; a row without `&=` or with one step stays as it is. */
function stackRow(row: string): string {
  const marks = topLevelMarks(row);
  if (marks === null) return row;
  const amp = marks.find((mark) => mark.char === '&');
  if (!amp || !row.slice(amp.at + 1).trimStart().startsWith('=')) return row;
  const equals = marks.filter((mark) => mark.char === '=' && mark.at > amp.at);
  if (equals.length < 2) return row;
  const steps = equals.map((mark, index) => row.slice(mark.at + 1, equals[index + 1]?.at ?? row.length).trim());
  return `${row.slice(0, amp.at).trimEnd()} &= ${steps.join(' \\\\ &= ')}`;
}

/** The rows of an aligned body, split at its top-level `\\`; null when the braces do not balance. */
function topLevelRows(body: string): string[] | null {
  const marks = topLevelMarks(body);
  if (marks === null) return null;
  const rows: string[] = [];
  let from = 0;
  for (const mark of marks) {
    if (mark.char !== '\\\\') continue;
    rows.push(body.slice(from, mark.at));
    from = mark.at + 2;
  }
  rows.push(body.slice(from));
  return rows;
}

interface Mark {
  char: '&' | '=' | '\\\\';
  at: number;
}

/** Positions of `&`, `=` and `\\` outside every group; null when the groups do not balance. */
function topLevelMarks(text: string): Mark[] | null {
  const marks: Mark[] = [];
  let depth = 0;
  for (let i = 0; i < text.length; i++) {
    const char = text[i];
    if (char === '\\') {
      const next = text[i + 1] ?? '';
      if (next === '\\') {
        if (depth === 0) marks.push({ char: '\\\\', at: i });
        i += 1;
        continue;
      }
      const name = /^[A-Za-z]+/.exec(text.slice(i + 1))?.[0];
      if (name === undefined) {
        i += 1; // an escaped character: \{ \} \& \, ...
        continue;
      }
      if (name === 'left' || name === 'begin') depth += 1;
      if (name === 'right' || name === 'end') depth -= 1;
      i += name.length;
      continue;
    }
    if (char === '{') depth += 1;
    else if (char === '}') depth -= 1;
    else if (depth === 0 && (char === '&' || char === '=')) marks.push({ char, at: i });
    if (depth < 0) return null;
  }
  return depth === 0 ? marks : null;
}
