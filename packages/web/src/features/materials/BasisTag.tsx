import type { MaterialBasis } from '@sheaf/engine';

const WORDS: Record<MaterialBasis, { short: string; long: string }> = {
  minimum: { short: 'min.', long: 'specification minimum' },
  typical: { short: 'typ.', long: 'typical (handbook mean or typical value)' },
  design: { short: 'design', long: 'design value' },
};

/** The basis of a material value as a small word (never colour alone), with the full words for assistive technology. */
export function BasisTag({ basis }: { basis: MaterialBasis }) {
  const words = WORDS[basis];
  return (
    <span
      title={words.long}
      className="ml-1 rounded-[2px] border border-paper-rule px-1 align-[1px] font-sans text-[0.6875rem] text-ink-muted"
    >
      <span aria-hidden="true">{words.short}</span>
      <span className="sr-only">{words.long}</span>
    </span>
  );
}
