import { MATERIAL_PROPERTIES, type MaterialPropertyKey } from '@sheaf/engine';

/**
 * The caution under a material's values when some of them could not be confirmed against their
 * source: which values, and what to do before relying on a result that uses them. Nothing when
 * every value listed is confirmed.
 * @example <SourceCaution keys={['Sy', 'Sut']} use="this check" />
 */
export function SourceCaution({ keys, use = 'a result' }: { keys: readonly MaterialPropertyKey[]; use?: string }) {
  if (keys.length === 0) return null;
  const one = keys.length === 1;
  const names = keys.map((key) => MATERIAL_PROPERTIES[key].label).join(', ');
  return (
    <p role="note" className="mt-1 border-l-2 border-ink pl-2 text-[0.8125rem] text-ink">
      <span className="font-medium">Caution, source not confirmed:</span> {names} {one ? 'was' : 'were'} not confirmed against the
      published source named beside {one ? 'it' : 'them'}. Verify {one ? 'it' : 'them'} against the specification or the material
      certificate before relying on {use}.
    </p>
  );
}
