import { describe, expect, it } from 'vitest';
import { parseRows, rowsText } from './pointRows';

describe('point rows', () => {
  it('reads rows split by commas, spaces or semicolons and skips blank lines', () => {
    expect(parseRows('80, -40, 25\n\n100 20 5\n1e2;0;-3.5')).toEqual({
      ok: true,
      rows: [
        [80, -40, 25],
        [100, 20, 5],
        [100, 0, -3.5],
      ],
    });
  });

  it('names the line and the text that is not a number', () => {
    expect(parseRows('80, -40, 25\n100, x20, 5')).toEqual({ ok: false, error: 'rows, line 2: "x20" is not a number' });
  });

  it('writes rows back as they are read', () => {
    const rows = [
      [80, -40, 25],
      [100, 20, 5],
    ];
    expect(parseRows(rowsText(rows))).toEqual({ ok: true, rows });
  });
});
