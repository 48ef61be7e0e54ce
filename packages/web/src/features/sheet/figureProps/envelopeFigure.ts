import {
  envelopeOf,
  envelopesFor,
  THEORIES,
  THEORY_IDS,
  type CellResult,
  type EnvelopeGeometry,
  type Strength,
  type UnitSystemId,
} from '@sheaf/engine';
import type { EnvelopeCurve } from '../figures/failureEnvelopeLayout';
import { stressDisplayUnit } from './displayUnit';

/** What the failure-envelope figure of a criterion draws. Pa. */
export interface EnvelopeFigureData {
  envelopes: EnvelopeCurve[];
  point: { sA: number; sB: number };
  /** The factor along the load line (null when unbounded). */
  factor: number | null;
  required: number;
}

function strengthText(strength: Strength, system: UnitSystemId): string {
  const unit = stressDisplayUnit(system);
  return Object.entries(strength)
    .filter((entry): entry is [string, number] => typeof entry[1] === 'number')
    .map(([key, value]) =>
      key === 'phi' ? `φ = ${round((value * 180) / Math.PI)}°` : `${key} = ${round(value * unit.perPa)} ${unit.label}`,
    )
    .join(', ');
}

const round = (value: number) => String(Number(value.toPrecision(4)));

function curvesOf(geometry: EnvelopeGeometry, label: string): EnvelopeCurve[] {
  return geometry.principalPlane
    .filter((outline) => outline.length > 1)
    .map((outline) => ({
      theory: geometry.theory,
      label,
      points: outline.map((p): [number, number] => [p.sA, p.sB]),
    }));
}

/**
 * The envelope figure of a criterion result on a plane state: the theory's outline in the
 * σ1–σ2 plane for the cell's strengths, the state's point (p1, p2) and the load line to the
 * envelope. With `compare`, the outlines of the other theories the same strengths allow are
 * drawn too. Null for failed cells and for states that are not plane (the plot has no place
 * for them); Mohr-Coulomb's load line runs at its load factor.
 */
export function envelopeFigureOf(result: CellResult | undefined, system: UnitSystemId, compare: boolean): EnvelopeFigureData | null {
  const plot = envelopeOf(result);
  if (!plot || !plot.loadLine || !result?.ok) return null;
  const { theory, strength } = plot;
  const label = `${THEORIES[theory].label}, ${strengthText(strength, system)}`;
  const envelopes = curvesOf(plot.envelope, label);
  if (compare) {
    const others = THEORY_IDS.filter((id) => id !== theory);
    const extent = extentOf(plot.envelope);
    for (const geometry of envelopesFor(others, strength, extent ? { extent } : undefined)) {
      envelopes.push(...curvesOf(geometry, THEORIES[geometry.theory].label));
    }
  }
  const factor = Number.isFinite(plot.loadLine.factor) ? plot.loadLine.factor : null;
  const required = typeof result.values.required === 'number' ? result.values.required : 1;
  return { envelopes, point: plot.loadLine.point, factor, required };
}

/** How far the main outline reaches, so the compared outlines are cut at the same size. */
function extentOf(geometry: EnvelopeGeometry): number | undefined {
  let extent = 0;
  for (const outline of geometry.principalPlane) for (const p of outline) extent = Math.max(extent, Math.abs(p.sA), Math.abs(p.sB));
  return extent > 0 ? extent : undefined;
}
