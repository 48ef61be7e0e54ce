/** Rows of stress numbers as a person types them: one row per line, numbers apart by commas or spaces. */
export function rowsText(rows: readonly (readonly number[])[]): string {
  return rows.map((row) => row.join(', ')).join('\n');
}

/**
 * Read typed rows back. Blank lines are skipped; anything that is not a number is an error that
 * names its line and the text, so nothing is written until the rows read cleanly.
 * @example parseRows('80, -40, 25\n100 20 5') // { ok: true, rows: [[80, -40, 25], [100, 20, 5]] }
 */
export function parseRows(text: string): { ok: true; rows: number[][] } | { ok: false; error: string } {
  const rows: number[][] = [];
  const lines = text.split(/\r?\n/);
  for (const [index, line] of lines.entries()) {
    if (line.trim() === '') continue;
    const parts = line.trim().split(/[\s,;]+/);
    const row: number[] = [];
    for (const part of parts) {
      const value = Number(part);
      if (part === '' || !Number.isFinite(value)) {
        return { ok: false, error: `rows, line ${index + 1}: "${part}" is not a number` };
      }
      row.push(value);
    }
    rows.push(row);
  }
  return { ok: true, rows };
}
