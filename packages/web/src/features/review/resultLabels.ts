/**
 * Words for the values of a result, as a diff or a revision shows them beside the key. Keys not
 * listed here are shown as they are.
 */
const LABELS: Readonly<Record<string, string>> = {
  factor: 'factor of safety',
  margin: 'margin of safety',
  pass: 'verdict',
  required: 'required factor',
  equivalent: 'equivalent stress',
  sx: 'σx',
  sy: 'σy',
  sz: 'σz',
  txy: 'τxy',
  tyz: 'τyz',
  tzx: 'τzx',
  s1: 'σ1',
  s2: 'σ2',
  s3: 'σ3',
  p1: 'in-plane σ1',
  p2: 'in-plane σ2',
  thetaP: 'principal angle',
  tauMax: 'τmax (absolute)',
  tauMaxInPlane: 'τmax in plane',
  vonMises: 'von Mises stress',
  tauOct: 'τ octahedral',
  minFactor: 'least factor of safety',
  failing: 'failing points',
  count: 'points',
  worstRow: 'worst point (row)',
};

/** What a result key means, or null when there are no better words than the key itself. */
export function resultLabel(key: string): string | null {
  return LABELS[key] ?? null;
}
