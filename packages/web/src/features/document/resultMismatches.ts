import type { MachineCell, ResultValue } from '@sheaf/engine';

/** One place where a result evaluated now differs from the result issued. */
export interface ResultMismatch {
  readonly cellId: string;
  readonly cellName: string;
  /** The value's key (`factor`, `sx`, ...); null when the whole result differs (an error, a missing result). */
  readonly key: string | null;
  /** As issued (stored with the revision), in words: SI numbers, `error code: message`, or "no result". */
  readonly issued: string;
  /** As this browser computes it now, in the same words. */
  readonly now: string;
}

/**
 * Relative tolerance of the comparison. The browser and the server run the same engine on the
 * same content, and stored numbers round-trip exactly through JSON, so equal results are equal to
 * the last bit; the tolerance only forgives a last-digit difference of floating-point libraries.
 */
const RELATIVE_TOLERANCE = 1e-12;

/**
 * Compare a cell's issued result with the result computed now, value by value (machine output:
 * SI numbers, booleans, nulls for unbounded factors, lists). Every key on either side is
 * compared; a key present on one side only is a difference.
 */
export function resultMismatches(
  cellId: string,
  cellName: string,
  issued: MachineCell | undefined,
  now: MachineCell | undefined,
): ResultMismatch[] {
  const whole = (a: string, b: string): ResultMismatch[] => [{ cellId, cellName, key: null, issued: a, now: b }];
  if (!issued && !now) return [];
  if (!issued || !now) return whole(describeCell(issued), describeCell(now));
  if (issued.error || now.error) {
    const same = issued.error && now.error && issued.error.code === now.error.code && issued.error.message === now.error.message;
    return same ? [] : whole(describeCell(issued), describeCell(now));
  }
  const a = issued.values ?? {};
  const b = now.values ?? {};
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])];
  return keys
    .filter((key) => !sameValue(a[key], b[key]))
    .map((key) => ({ cellId, cellName, key, issued: describeValue(a[key]), now: describeValue(b[key]) }));
}

function sameValue(a: ResultValue | undefined, b: ResultValue | undefined): boolean {
  if (typeof a === 'number' && typeof b === 'number') return sameNumber(a, b);
  if (Array.isArray(a) && Array.isArray(b)) {
    return a.length === b.length && a.every((x, i) => (x === null || b[i] === null ? x === b[i] : sameNumber(x, b[i] as number)));
  }
  return a === b;
}

function sameNumber(a: number, b: number): boolean {
  if (a === b) return true;
  return Math.abs(a - b) <= RELATIVE_TOLERANCE * Math.max(Math.abs(a), Math.abs(b));
}

function describeCell(cell: MachineCell | undefined): string {
  if (!cell) return 'no result';
  if (cell.error) return `${cell.error.code}: ${cell.error.message}`;
  return 'values';
}

function describeValue(value: ResultValue | undefined): string {
  if (value === undefined) return 'absent';
  if (value === null) return 'unbounded';
  if (Array.isArray(value)) return `[${value.map((x) => (x === null ? 'null' : String(x))).join(', ')}]`;
  return String(value);
}
