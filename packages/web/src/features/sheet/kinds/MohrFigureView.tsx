import { useMemo, useState } from 'react';
import { setTextField } from '../doc/fieldWrites';
import { stressDisplayUnit } from '../figureProps/displayUnit';
import { angleText, mohrFigureOf } from '../figureProps/mohrFigure';
import { MohrCircle } from '../figures/MohrCircle';
import { MohrCircles3D } from '../figures/MohrCircles3D';
import { useSheetEditor } from '../hooks/useSheetEditor';
import { useSheetSettings } from '../hooks/useSheetSettings';
import type { KindViewProps } from './kindView';

/**
 * Mohr's circle of a cell's stress state: the in-plane circle for a plane state, the three
 * circles with the admissible region hatched for any other. The sheet's shear-axis setting
 * only mirrors the τ axis; no number changes with it. On a rotate cell, writers can drag the
 * rotated diameter: the new angle is written into the cell's `angle` (e.g. "32.5 deg").
 */
export function MohrFigureView({ cell, cellName, result }: KindViewProps) {
  const { doc, readOnly } = useSheetEditor();
  const { unitSystem, shearAxis } = useSheetSettings(doc);
  const data = useMemo(() => mohrFigureOf(result), [result]);
  const unit = useMemo(() => stressDisplayUnit(unitSystem), [unitSystem]);
  const [three, setThree] = useState(false);
  if (!data) return null;
  const canRotate = cell.kind === 'rotate' && !readOnly;
  const offerThree = data.kind === 'plane' && cell.kind === 'principal';
  const title = `Mohr's circle${data.kind === 'three' || (offerThree && three) ? 's' : ''} of ${cellName || 'the state'}`;

  return (
    <figure className="m-0" data-figure-of={cell.id}>
      {offerThree ? (
        <div className="no-print mb-1 flex gap-1 text-[0.75rem]" role="group" aria-label="Which circles">
          <button type="button" className="btn px-2 py-0.5" aria-pressed={!three} onClick={() => setThree(false)}>
            In-plane circle
          </button>
          <button type="button" className="btn px-2 py-0.5" aria-pressed={three} onClick={() => setThree(true)}>
            Three circles
          </button>
        </div>
      ) : null}
      {data.kind === 'plane' && !(offerThree && three) ? (
        <MohrCircle
          sx={data.sx}
          sy={data.sy}
          txy={data.txy}
          rotated={data.rotated}
          unit={unit}
          shearAxis={shearAxis}
          title={title}
          onRotate={canRotate ? (angleRad) => setTextField(doc, cell.id, 'angle', angleText(angleRad)) : undefined}
        />
      ) : (
        <MohrCircles3D s1={data.s1} s2={data.s2} s3={data.s3} unit={unit} shearAxis={shearAxis} title={title} />
      )}
      {canRotate && data.kind === 'plane' ? (
        <figcaption className="no-print mt-1 text-[0.75rem] text-ink-faint">
          Drag X′ round the circle (or focus it and use the arrow keys) to set θ.
        </figcaption>
      ) : null}
    </figure>
  );
}
