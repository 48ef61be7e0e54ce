import type { MaterialPropertyKey } from '@sheaf/engine';

const SYMBOLS: Record<MaterialPropertyKey, [string, string]> = {
  Sy: ['S', 'y'],
  Sut: ['S', 'ut'],
  Suc: ['S', 'uc'],
  c: ['c', ''],
  phi: ['φ', ''],
  E: ['E', ''],
  nu: ['ν', ''],
};

/** The trade's symbol of a material property (S with subscript y, φ, ν, ...). */
export function PropertySymbol({ name }: { name: MaterialPropertyKey }) {
  const [base, sub] = SYMBOLS[name];
  return (
    <span className="font-serif italic">
      {base}
      {sub ? <sub className="not-italic">{sub}</sub> : null}
    </span>
  );
}
