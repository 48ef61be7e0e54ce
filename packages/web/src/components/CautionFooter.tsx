/** The caution every Sheaf page carries, on screen and in print. */
export const CAUTION_TEXT =
  'Results support, not replace, the judgement of a qualified engineer. Verify against the governing codes; approval rests with licensed practice.';

export function CautionFooter() {
  return (
    <footer className="border-t border-frame-line bg-frame px-4 py-2 text-[0.8125rem] text-frame-muted print:border-ink print:bg-white print:text-ink">
      <p>
        <span className="font-medium text-frame-text print:text-ink">Caution: </span>
        {CAUTION_TEXT}
      </p>
    </footer>
  );
}
