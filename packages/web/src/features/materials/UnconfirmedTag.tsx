import { UNCONFIRMED_SOURCE_WORDS } from '@sheaf/engine';

/**
 * The mark of a material value whose source could not be confirmed (`confirmed: false`): a small
 * word in a dashed box, never a colour or a symbol alone, with the full words for assistive
 * technology. It sits beside the value's basis wherever the value is shown.
 */
export function UnconfirmedTag() {
  return (
    <span
      title={`${UNCONFIRMED_SOURCE_WORDS}: check this value against the specification or the material certificate`}
      className="ml-1 rounded-[2px] border border-dashed border-ink px-1 align-[1px] font-sans text-[0.6875rem] font-medium text-ink"
    >
      <span aria-hidden="true">unconfirmed</span>
      <span className="sr-only">{UNCONFIRMED_SOURCE_WORDS}</span>
    </span>
  );
}
