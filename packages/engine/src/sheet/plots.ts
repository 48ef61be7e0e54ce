import { planeLoadLine, type LoadLine } from '../criteria/loadLine';
import { THEORIES } from '../criteria/theories';
import type { EnvelopeGeometry, EnvelopeOptions, Strength, TheoryId } from '../criteria/types';
import type { CellResult } from '../kinds/result';
import { mohrCircles3D, planeMohrCircle, type Mohr3D, type PlaneMohrCircle } from '../stress/mohrCircle';
import { hasPrincipalZ } from '../stress/types';

/** Mohr's-circle data of a result, for plotting. @public */
export interface MohrPlot {
  /** The x-y circle with its face points; present when z is a principal direction (every plane state). For a rotate cell it holds the rotated pair. */
  readonly plane: PlaneMohrCircle | null;
  /** The three circles from the principal stresses. */
  readonly circles: Mohr3D;
}

/**
 * Mohr's-circle geometry of a stress, rosette, rotate, principal or criterion result (null for
 * other kinds and failures). Units: Pa, radians.
 * @public
 */
export function mohrOf(result: CellResult | undefined): MohrPlot | null {
  if (!result || !result.ok || !result.state) return null;
  const base = result.rotation?.from ?? result.state;
  const plane = hasPrincipalZ(base) ? planeMohrCircle(base, result.rotation?.angleRad) : null;
  return { plane, circles: mohrCircles3D(base) };
}

/** Envelope data of a criterion or point-set result, for plotting. @public */
export interface EnvelopePlot {
  readonly theory: TheoryId;
  readonly strength: Strength;
  readonly envelope: EnvelopeGeometry;
  /** The state's load line on the sA–sB plot (criterion on a plane state only). */
  readonly loadLine: LoadLine | null;
}

/**
 * Envelope geometry of a criterion or point-set result: the theory's outline for its strengths
 * and, for a criterion on a plane state, the load line through (p1, p2) to the envelope.
 * @public
 */
export function envelopeOf(result: CellResult | undefined, options?: EnvelopeOptions): EnvelopePlot | null {
  if (!result || !result.ok || !result.criterion) return null;
  const { theory, strength } = result.criterion;
  const extent = options?.extent ?? extentFor(result.state ? Math.abs(result.state.sx) + Math.abs(result.state.sy) + Math.abs(result.state.sz) : 0);
  const envelope = THEORIES[theory].envelope(strength, { ...options, extent });
  const factor = result.values.factor === null ? Infinity : (result.values.factor as number | undefined);
  // Mohr-Coulomb's factor is strength reduction; the load line belongs to its loadFactor.
  const along = theory === 'mohr-coulomb' ? ((result.values.loadFactor as number | null) ?? Infinity) : factor;
  const loadLine = result.state && along !== undefined ? planeLoadLine(result.state, along) : null;
  return { theory, strength, envelope, loadLine };
}

const extentFor = (size: number): number | undefined => (size > 0 ? 3 * size : undefined);

/**
 * Envelopes of several theories for the same strengths, to overlay on one sA–sB plot (theories
 * whose strengths are missing are left out).
 * @public
 */
export function envelopesFor(theories: readonly TheoryId[], strength: Strength, options?: EnvelopeOptions): EnvelopeGeometry[] {
  return theories.filter((t) => THEORIES[t].validate(strength) === null).map((t) => THEORIES[t].envelope(strength, options));
}
