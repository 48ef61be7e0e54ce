import type { KindId } from '@sheaf/engine';
import { CriterionInputs } from './CriterionView';
import { EnvelopeFigureView } from './EnvelopeFigureView';
import type { KindView } from './kindView';
import { MohrFigureView } from './MohrFigureView';
import { NoteInputs } from './NoteView';
import { PointsetInputs } from './PointsetView';
import { QuantityInputs } from './QuantityView';
import { RosetteInputs } from './RosetteView';
import { ReferenceOnlyInputs, RotateInputs } from './RotateView';
import { StressInputs } from './StressView';

/**
 * How each kind of cell appears: one entry per kind of the sheet format, typed by kind id, so a
 * kind without a view fails the type check. Order is the order of the add menu.
 */
export const KIND_VIEWS: Readonly<Record<KindId, KindView>> = {
  note: { label: 'Note', hint: 'Text with Markdown and $math$: load cases, sources, assumptions', Inputs: NoteInputs },
  quantity: { label: 'Quantity', hint: 'A named value with units, e.g. F = 18 kN', Inputs: QuantityInputs },
  stress: {
    label: 'Stress state',
    hint: 'σx, σy, τxy (and σz, τyz, τzx) with its Mohr’s circle',
    Inputs: StressInputs,
    Figure: MohrFigureView,
  },
  rosette: { label: 'Strain rosette', hint: 'Three gauge readings reduced to strains and stresses', Inputs: RosetteInputs },
  rotate: {
    label: 'Rotated axes',
    hint: 'The stress state on axes turned by θ; drag it on the circle',
    Inputs: RotateInputs,
    Figure: MohrFigureView,
  },
  principal: {
    label: 'Principal stresses',
    hint: 'σ1 ≥ σ2 ≥ σ3, directions, maximum shear, von Mises',
    Inputs: ReferenceOnlyInputs,
    Figure: MohrFigureView,
  },
  criterion: {
    label: 'Failure check',
    hint: 'Factor of safety by a failure theory, with its envelope',
    Inputs: CriterionInputs,
    Figure: EnvelopeFigureView,
  },
  pointset: { label: 'Point set', hint: 'Many stress points checked at once; the worst one found', Inputs: PointsetInputs },
};
