import { z } from 'zod';
import { stressInvariants } from '../stress/invariants';
import { octahedralStresses } from '../stress/octahedral';
import { principalPlaneStresses } from '../stress/principalPlane';
import { principalStresses } from '../stress/principalStresses';
import { hasPrincipalZ } from '../stress/types';
import { vonMisesStress } from '../stress/vonMises';
import { texQuantity, texTerm } from './latex';
import { isFailure, ValuesBuilder } from './result';
import { cellIdSchema, cellNameSchema, stateReferenceSchema } from './schemaParts';
import type { CellKind } from './types';

/** A principal cell: principal stresses and derived values of a stress state. @public */
export const principalCellSchema = z
  .strictObject({
    id: cellIdSchema,
    kind: z.literal('principal'),
    name: cellNameSchema,
    of: stateReferenceSchema,
  })
  .meta({ title: 'principal', description: 'Principal stresses, maximum shear, von Mises, invariants and Mohr circles of `of`' });

/** @public */
export type PrincipalCell = z.infer<typeof principalCellSchema>;

/**
 * Principal: of the stress state `of`,
 * - `s1`, `s2`, `s3`: the three principal stresses, s1 >= s2 >= s3 (a plane state's out-of-plane
 *   0 takes its place in the order), with unit direction vectors `n1`, `n2`, `n3`;
 * - when z is a principal direction (tyz = tzx = 0, every plane state): `p1`, `p2` (the in-plane
 *   pair), `thetaP` (x to p1, in (-90°, 90°]), `tauMaxInPlane`, `thetaS` (x to the face of
 *   +tauMaxInPlane) and `centerInPlane`;
 * - `tauMax` = (s1 - s3)/2, `tresca` = s1 - s3, `vonMises`, `sigmaOct`, `tauOct`;
 * - `I1`, `I2`, `I3` with s³ - I1 s² + I2 s - I3 = 0;
 * - Mohr circles `center12`, `radius12`, `center23`, `radius23`, `center13`, `radius13`.
 * Referable as a stress state (the state of `of`).
 * @example { kind: 'principal', name: 'P', of: 'S' }
 * @public
 */
export const principalKind: CellKind<PrincipalCell> = {
  id: 'principal',
  label: 'Principal stresses',
  schema: principalCellSchema,
  expressions: () => [],
  references: (cell) => [['of', cell.of]],
  evaluate(cell, context) {
    const state = context.state('of', cell.of);
    if (isFailure(state)) return state;
    const principal = principalStresses(state);
    const [s1, s2, s3] = principal.values;
    const values = new ValuesBuilder().number('s1', s1, 'stress').number('s2', s2, 'stress').number('s3', s3, 'stress');
    if (hasPrincipalZ(state)) {
      const p = principalPlaneStresses(state);
      values
        .number('p1', p.p1, 'stress')
        .number('p2', p.p2, 'stress')
        .number('thetaP', p.thetaP, 'angle')
        .number('tauMaxInPlane', p.tauMaxInPlane, 'stress')
        .number('thetaS', p.thetaS, 'angle')
        .number('centerInPlane', p.center, 'stress');
    }
    const inv = stressInvariants(state);
    const oct = octahedralStresses(s1, s2, s3);
    values
      .number('tauMax', (s1 - s3) / 2, 'stress')
      .number('tresca', s1 - s3, 'stress')
      .number('vonMises', vonMisesStress(state), 'stress')
      .number('sigmaOct', oct.normal, 'stress')
      .number('tauOct', oct.shear, 'stress')
      .number('I1', inv.I1, 'stress')
      .number('I2', inv.I2, 'stress2')
      .number('I3', inv.I3, 'stress3');
    // The three Mohr circles from the principal stresses already found (as mohrCircles3D does).
    values
      .number('center12', (s1 + s2) / 2, 'stress')
      .number('radius12', (s1 - s2) / 2, 'stress')
      .number('center23', (s2 + s3) / 2, 'stress')
      .number('radius23', (s2 - s3) / 2, 'stress')
      .number('center13', (s1 + s3) / 2, 'stress')
      .number('radius13', (s1 - s3) / 2, 'stress');
    principal.directions.forEach((d, i) => values.list(`n${i + 1}`, d, 'ratio'));
    return values.ok(cell.id, 'principal', { state });
  },
  equation(_cell, result, context) {
    const t = result.state;
    if (!t) return null;
    const sys = context.system;
    const n = (v: number) => texTerm(v, 'stress', sys);
    const q = (k: string) => texQuantity(result.values[k] as number, 'stress', sys);
    const lines: string[] = [];
    if (typeof result.values.p1 === 'number') {
      lines.push(
        `p_{1,2} &= \\frac{\\sigma_x+\\sigma_y}{2} \\pm \\sqrt{\\left(\\frac{\\sigma_x-\\sigma_y}{2}\\right)^2+\\tau_{xy}^2}` +
          ` = \\frac{${n(t.sx)}+${n(t.sy)}}{2} \\pm \\sqrt{\\left(\\frac{${n(t.sx)}-${n(t.sy)}}{2}\\right)^2+${n(t.txy)}^2}` +
          ` = ${q('p1')},\\ ${q('p2')}`,
      );
      lines.push(
        `\\theta_p &= \\tfrac{1}{2}\\operatorname{atan2}(2\\tau_{xy},\\ \\sigma_x-\\sigma_y) = ${texQuantity(result.values.thetaP as number, 'angle', sys)}`,
      );
    } else {
      lines.push(
        `&\\sigma^3 - I_1\\sigma^2 + I_2\\sigma - I_3 = 0,\\quad I_1 = ${texQuantity(result.values.I1 as number, 'stress', sys)},\\ ` +
          `I_2 = ${texQuantity(result.values.I2 as number, 'stress2', sys)},\\ I_3 = ${texQuantity(result.values.I3 as number, 'stress3', sys)}`,
      );
    }
    lines.push(`\\sigma_{1,2,3} &= ${q('s1')},\\ ${q('s2')},\\ ${q('s3')}`);
    lines.push(`\\tau_{max} &= \\frac{\\sigma_1-\\sigma_3}{2} = ${q('tauMax')}`);
    lines.push(
      `\\sigma_{vM} &= \\sqrt{\\tfrac{1}{2}\\left[(\\sigma_1-\\sigma_2)^2+(\\sigma_2-\\sigma_3)^2+(\\sigma_3-\\sigma_1)^2\\right]} = ${q('vonMises')}`,
    );
    return `\\begin{aligned}${lines.join(' \\\\ ')}\\end{aligned}`;
  },
};
