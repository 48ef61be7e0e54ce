const ALIGNED_START = '\\begin{aligned}';
const ALIGNED_END = '\\end{aligned}';

/** One line of an equation laid out for paper. */
export type EquationRow =
  /** `lhs = steps[0] = steps[1] …`: one step per line, each under the last, aligned on the equals sign. */
  | { readonly lhs: string; readonly steps: readonly string[] }
  /** A line kept whole (no `lhs &=` to align on), e.g. a characteristic equation with its invariants. */
  | { readonly line: string };

/**
 * An equation laid out for paper, as a hand calculation is written: each row `lhs &= a = b = c` of
 * an `aligned` block becomes its left-hand side and the steps `a`, `b`, `c`, set one under the
 * other. On screen the chain reads left to right on one line; a page is too narrow for it, and
 * KaTeX cannot break a line inside an aligned block, while each step set on its own can break
 * after a relation or an operator. Only equals signs at the top level of a row are steps (not
 * those inside braces, `\left…\right` or a nested environment). An equation that is not one
 * aligned block is one line, as it is.
 * @example equationSteps('\\begin{aligned}n &= \\frac{S_y}{\\sigma} = \\frac{250}{125} = 2\\end{aligned}')
 *   // [{ lhs: 'n', steps: ['\\frac{S_y}{\\sigma}', '\\frac{250}{125}', '2'] }]
 */
export function equationSteps(latex: string): EquationRow[] {
  const trimmed = latex.trim();
  if (!trimmed.startsWith(ALIGNED_START) || !trimmed.endsWith(ALIGNED_END)) return [{ line: latex }];
  const body = trimmed.slice(ALIGNED_START.length, trimmed.length - ALIGNED_END.length);
  const rows = topLevelRows(body);
  if (rows === null) return [{ line: latex }];
  return rows.filter((row) => row.trim() !== '').map(stepsOf);
}

/** `lhs &= a = b` → { lhs, steps: [a, b] }; a row without `&=` is one line (its `&` dropped). */
function stepsOf(row: string): EquationRow {
  const marks = topLevelMarks(row) ?? [];
  const amp = marks.find((mark) => mark.char === '&');
  if (!amp || !row.slice(amp.at + 1).trimStart().startsWith('=')) {
    return { line: marks.filter((mark) => mark.char === '&').reduceRight((text, mark) => text.slice(0, mark.at) + text.slice(mark.at + 1), row).trim() };
  }
  const equals = marks.filter((mark) => mark.char === '=' && mark.at > amp.at);
  const steps = equals.map((mark, index) => row.slice(mark.at + 1, equals[index + 1]?.at ?? row.length).trim());
  return { lhs: row.slice(0, amp.at).trim(), steps };
}

/** The rows of an aligned body, split at its top-level `\\`; null when the groups do not balance. */
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
