import { z } from 'zod';
import { rotatePlaneStress } from '../stress/rotatePlaneStress';
import type { StressTensor } from '../stress/types';
import { texNumber, texQuantity, texTerm } from './latex';
import { isFailure, ValuesBuilder } from './result';
import { cellIdSchema, cellNameSchema, expressionSchema, stateReferenceSchema } from './schemaParts';
import type { CellKind } from './types';

/** A rotate cell: a stress state on axes turned about z. @public */
export const rotateCellSchema = z
  .strictObject({
    id: cellIdSchema,
    kind: z.literal('rotate'),
    name: cellNameSchema,
    of: stateReferenceSchema,
    angle: expressionSchema.meta({ description: 'Angle from x to x\', counterclockwise, e.g. "30 deg"' }),
  })
  .meta({ title: 'rotate', description: 'The stress state of `of` on axes turned by `angle` about z' });

/** @public */
export type RotateCell = z.infer<typeof rotateCellSchema>;

/**
 * Turn a tensor's axes about z by `angleRad`: the in-plane part by the plane transformation, the
 * out-of-plane shears as a vector (tz'x' = tzx cosθ + tyz sinθ, ty'z' = tyz cosθ - tzx sinθ).
 * @public
 */
export function rotateAboutZ(t: StressTensor, angleRad: number): StressTensor {
  const plane = rotatePlaneStress(t, angleRad);
  const c = Math.cos(angleRad);
  const s = Math.sin(angleRad);
  return { ...plane, sz: t.sz, tyz: t.tyz * c - t.tzx * s, tzx: t.tzx * c + t.tyz * s };
}

/**
 * Rotate: the stress state of `of` on axes x'y' turned counterclockwise by `angle` about z
 * (stress transformation; e.g. Gere & Goodno, Mechanics of Materials, Sec. 7.2). Values: sx,
 * sy, txy on the turned axes (and sz, tyz, tzx for a 3D state); referable as a stress state.
 * @example { kind: 'rotate', name: 'R', of: 'S', angle: '30 deg' }
 * @public
 */
export const rotateKind: CellKind<RotateCell> = {
  id: 'rotate',
  label: 'Rotated stress state',
  schema: rotateCellSchema,
  expressions: (cell) => [['angle', cell.angle]],
  references: (cell) => [['of', cell.of]],
  evaluate(cell, context) {
    const from = context.state('of', cell.of);
    if (isFailure(from)) return from;
    const angleRad = context.value('angle', cell.angle, 'angle');
    if (isFailure(angleRad)) return angleRad;
    const state = rotateAboutZ(from, angleRad);
    const values = new ValuesBuilder()
      .number('sx', state.sx, 'stress')
      .number('sy', state.sy, 'stress')
      .number('txy', state.txy, 'stress')
      .number('sz', state.sz, 'stress')
      .number('tyz', state.tyz, 'stress')
      .number('tzx', state.tzx, 'stress')
      .number('angle', angleRad, 'angle');
    return values.ok(cell.id, 'rotate', { state, rotation: { from, angleRad } });
  },
  equation(_cell, result, context) {
    if (!result.rotation || !result.state) return null;
    const { from, angleRad } = result.rotation;
    const sys = context.system;
    const n = (v: number) => texTerm(v, 'stress', sys);
    const twoTheta = texNumber(2 * angleRad, 'angle', sys);
    const sx =
      `\\sigma_{x'} &= \\frac{\\sigma_x+\\sigma_y}{2} + \\frac{\\sigma_x-\\sigma_y}{2}\\cos 2\\theta + \\tau_{xy}\\sin 2\\theta` +
      ` = \\frac{${n(from.sx)}+${n(from.sy)}}{2} + \\frac{${n(from.sx)}-${n(from.sy)}}{2}\\cos ${twoTheta}^{\\circ} + ${n(from.txy)}\\sin ${twoTheta}^{\\circ}` +
      ` = ${texQuantity(result.state.sx, 'stress', sys)}`;
    const txy =
      `\\tau_{x'y'} &= -\\frac{\\sigma_x-\\sigma_y}{2}\\sin 2\\theta + \\tau_{xy}\\cos 2\\theta` +
      ` = -\\frac{${n(from.sx)}-${n(from.sy)}}{2}\\sin ${twoTheta}^{\\circ} + ${n(from.txy)}\\cos ${twoTheta}^{\\circ}` +
      ` = ${texQuantity(result.state.txy, 'stress', sys)}`;
    const sy = `\\sigma_{y'} &= \\sigma_x + \\sigma_y - \\sigma_{x'} = ${texQuantity(result.state.sy, 'stress', sys)}`;
    return `\\begin{aligned}${sx} \\\\ ${sy} \\\\ ${txy}\\end{aligned}`;
  },
};
