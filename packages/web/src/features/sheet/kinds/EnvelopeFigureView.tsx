import { isFailure } from '@sheaf/engine';
import { useMemo, useState } from 'react';
import { stressDisplayUnit } from '../figureProps/displayUnit';
import { envelopeFigureOf } from '../figureProps/envelopeFigure';
import { FailureEnvelope } from '../figures/FailureEnvelope';
import { MohrCircles3D } from '../figures/MohrCircles3D';
import { useSheetEditor } from '../hooks/useSheetEditor';
import { useSheetSettings } from '../hooks/useSheetSettings';
import type { KindViewProps } from './kindView';

/**
 * The failure envelope of a criterion cell in the σ1–σ2 plane: the theory's outline, the stress
 * point, the load line to the envelope with its factor, and the verdict. A toggle overlays the
 * other theories the same strengths allow. A state with out-of-plane stress has no place on
 * that plane; its three Mohr's circles are shown instead.
 */
export function EnvelopeFigureView({ cell, cellName, result }: KindViewProps) {
  const { doc } = useSheetEditor();
  const { unitSystem, shearAxis } = useSheetSettings(doc);
  const [compare, setCompare] = useState(false);
  const data = useMemo(() => envelopeFigureOf(result, unitSystem, compare), [result, unitSystem, compare]);
  const unit = useMemo(() => stressDisplayUnit(unitSystem), [unitSystem]);
  if (!result || isFailure(result)) return null;

  if (!data) {
    const { s1, s2, s3 } = result.values;
    if (typeof s1 !== 'number' || typeof s2 !== 'number' || typeof s3 !== 'number') return null;
    return (
      <figure className="m-0" data-figure-of={cell.id}>
        <MohrCircles3D s1={s1} s2={s2} s3={s3} unit={unit} shearAxis={shearAxis} title={`Mohr's circles checked by ${cellName}`} />
        <figcaption className="mt-1 text-[0.75rem] text-ink-muted">
          The state has out-of-plane stress, so it has no point on the σ1–σ2 envelope; the factor above
          is the theory's for all three principal stresses.
        </figcaption>
      </figure>
    );
  }

  return (
    <figure className="m-0" data-figure-of={cell.id}>
      <label className="no-print mb-1 inline-flex items-center gap-1.5 text-[0.8125rem] text-ink-muted">
        <input type="checkbox" checked={compare} onChange={(event) => setCompare(event.target.checked)} />
        Compare with the other theories
      </label>
      <FailureEnvelope
        envelopes={data.envelopes}
        point={data.point}
        factor={data.factor}
        required={data.required}
        unit={unit}
        title={`Failure envelope of ${cellName || 'the check'}`}
      />
    </figure>
  );
}
