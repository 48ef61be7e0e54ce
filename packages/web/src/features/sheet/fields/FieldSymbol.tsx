/** A field's or value's symbol as the trade writes it: σ with a subscript x, E, ν. */
export function FieldSymbol({ symbol, sub }: { symbol: string; sub?: string | undefined }) {
  return (
    <span className="font-mono whitespace-nowrap">
      {symbol}
      {sub ? <sub className="text-[0.72em]">{sub}</sub> : null}
    </span>
  );
}
