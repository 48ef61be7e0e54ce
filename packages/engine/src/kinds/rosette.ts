import { z } from 'zod';
import { planeStressFromStrain } from '../stress/planeStressHooke';
import { reduceRosette, type RosetteLayout } from '../stress/rosette';
import { principalPlaneStrains } from '../stress/strainTransform';
import { texNumber, texPlain, texQuantity } from './latex';
import { cellFailure, isFailure, ValuesBuilder } from './result';
import { cellIdSchema, cellNameSchema, expressionSchema } from './schemaParts';
import type { CellKind, ExpressionField } from './types';

/** A rosette cell: three gauge readings reduced to strains and a plane stress state. @public */
export const rosetteCellSchema = z
  .strictObject({
    id: cellIdSchema,
    kind: z.literal('rosette'),
    name: cellNameSchema,
    layout: z.enum(['rectangular', 'delta', 'angles'], { error: 'must be "rectangular", "delta" or "angles"' }),
    angles: z
      .tuple([expressionSchema, expressionSchema, expressionSchema], { error: 'must be three angle expressions' })
      .optional()
      .meta({ description: 'Gauge angles a, b, c from x (layout "angles" only), e.g. ["0 deg", "30 deg", "100 deg"]' }),
    ea: expressionSchema.meta({ description: 'Strain of gauge a (on x), dimensionless, e.g. "540e-6"' }),
    eb: expressionSchema,
    ec: expressionSchema,
    E: expressionSchema.meta({ description: "Young's modulus, a pressure" }),
    nu: expressionSchema.meta({ description: "Poisson's ratio, a plain number" }),
  })
  .superRefine((cell, ctx) => {
    if (cell.layout === 'angles' && !cell.angles) {
      ctx.addIssue({ code: 'custom', path: ['angles'], message: 'is needed with layout "angles" (three gauge angles)' });
    }
    if (cell.layout !== 'angles' && cell.angles) {
      ctx.addIssue({ code: 'custom', path: ['angles'], message: `is only used with layout "angles" (the ${cell.layout} layout fixes them)` });
    }
  })
  .meta({ title: 'rosette', description: 'Strain-gauge rosette: readings ea, eb, ec, with E and nu' });

/** @public */
export type RosetteCell = z.infer<typeof rosetteCellSchema>;

/**
 * Rosette: reduce gauge readings (gauge a on x, b and c counterclockwise from it) to ex, ey and
 * the engineering shear strain gxy, the principal strains e1, e2 and the angle thetaE from x to
 * e1, then the plane stress state by Hooke's law (sx, sy, txy; referable as a stress state).
 * E must be positive and -1 < nu < 0.5.
 * @example { kind: 'rosette', name: 'G1', layout: 'rectangular', ea: '540e-6', eb: '180e-6', ec: '-120e-6', E: '200 GPa', nu: '0.3' }
 * @public
 */
export const rosetteKind: CellKind<RosetteCell> = {
  id: 'rosette',
  label: 'Strain rosette',
  schema: rosetteCellSchema,
  expressions(cell) {
    const fields: ExpressionField[] = [
      ['ea', cell.ea],
      ['eb', cell.eb],
      ['ec', cell.ec],
      ['E', cell.E],
      ['nu', cell.nu],
    ];
    cell.angles?.forEach((a, i) => fields.push([`angles[${i}]`, a]));
    return fields;
  },
  references: () => [],
  evaluate(cell, context) {
    const readings: number[] = [];
    for (const key of ['ea', 'eb', 'ec'] as const) {
      const v = context.value(key, cell[key], 'dimensionless');
      if (isFailure(v)) return v;
      readings.push(v);
    }
    const E = context.value('E', cell.E, 'pressure');
    if (isFailure(E)) return E;
    if (!(E > 0)) return cellFailure(cell.id, 'rosette', 'domain', 'E: must be positive');
    const nu = context.value('nu', cell.nu, 'dimensionless');
    if (isFailure(nu)) return nu;
    if (!(nu > -1 && nu < 0.5)) return cellFailure(cell.id, 'rosette', 'domain', 'nu: must lie between -1 and 0.5');
    let layout: RosetteLayout;
    if (cell.layout === 'angles') {
      const angles: number[] = [];
      for (const [i, text] of (cell.angles ?? []).entries()) {
        const a = context.value(`angles[${i}]`, text, 'angle');
        if (isFailure(a)) return a;
        angles.push(a);
      }
      layout = { kind: 'angles', anglesRad: angles as [number, number, number] };
    } else {
      layout = { kind: cell.layout };
    }
    const reduced = reduceRosette(layout, readings as [number, number, number]);
    if (!reduced.ok) return cellFailure(cell.id, 'rosette', 'domain', `angles: ${reduced.message}`);
    const strain = reduced.strain;
    const principal = principalPlaneStrains(strain);
    const stress = planeStressFromStrain(strain, E, nu);
    const values = new ValuesBuilder()
      .number('ex', strain.ex, 'strain')
      .number('ey', strain.ey, 'strain')
      .number('gxy', strain.gxy, 'strain')
      .number('e1', principal.e1, 'strain')
      .number('e2', principal.e2, 'strain')
      .number('thetaE', principal.thetaE, 'angle')
      .number('gammaMaxInPlane', principal.gammaMaxInPlane, 'strain')
      .number('sx', stress.sx, 'stress')
      .number('sy', stress.sy, 'stress')
      .number('txy', stress.txy, 'stress')
      .number('E', E, 'stress')
      .number('nu', nu, 'ratio');
    return values.ok(cell.id, 'rosette', { state: { ...stress, sz: 0, tyz: 0, tzx: 0 } });
  },
  equation(cell, result, context) {
    const sys = context.system;
    const v = (k: string) => result.values[k] as number;
    const lines: string[] = [];
    if (cell.layout === 'rectangular') {
      lines.push(`\\varepsilon_x &= \\varepsilon_a = ${texQuantity(v('ex'), 'strain', sys)}`);
      lines.push(`\\varepsilon_y &= \\varepsilon_c = ${texQuantity(v('ey'), 'strain', sys)}`);
      lines.push(`\\gamma_{xy} &= 2\\varepsilon_b - \\varepsilon_a - \\varepsilon_c = ${texQuantity(v('gxy'), 'strain', sys)}`);
    } else if (cell.layout === 'delta') {
      lines.push(`\\varepsilon_x &= \\varepsilon_a = ${texQuantity(v('ex'), 'strain', sys)}`);
      lines.push(`\\varepsilon_y &= \\tfrac{1}{3}(2\\varepsilon_b + 2\\varepsilon_c - \\varepsilon_a) = ${texQuantity(v('ey'), 'strain', sys)}`);
      lines.push(`\\gamma_{xy} &= \\tfrac{2}{\\sqrt{3}}(\\varepsilon_b - \\varepsilon_c) = ${texQuantity(v('gxy'), 'strain', sys)}`);
    } else {
      lines.push(
        `\\varepsilon_i &= \\varepsilon_x\\cos^2\\theta_i + \\varepsilon_y\\sin^2\\theta_i + \\gamma_{xy}\\sin\\theta_i\\cos\\theta_i \\Rightarrow ` +
          `\\varepsilon_x = ${texQuantity(v('ex'), 'strain', sys)},\\ \\varepsilon_y = ${texQuantity(v('ey'), 'strain', sys)},\\ \\gamma_{xy} = ${texQuantity(v('gxy'), 'strain', sys)}`,
      );
    }
    lines.push(
      `\\varepsilon_{1,2} &= \\frac{\\varepsilon_x+\\varepsilon_y}{2} \\pm \\sqrt{\\left(\\frac{\\varepsilon_x-\\varepsilon_y}{2}\\right)^2 + \\left(\\frac{\\gamma_{xy}}{2}\\right)^2} = ` +
        `${texQuantity(v('e1'), 'strain', sys)},\\ ${texQuantity(v('e2'), 'strain', sys)}`,
    );
    const E = texNumber(v('E'), 'stress', sys);
    const nu = texPlain(v('nu'));
    const k = `\\frac{${E}}{1-${nu}^2}`;
    const plain = (x: number) => (x < 0 ? `\\left(${texPlain(x)}\\right)` : texPlain(x));
    lines.push(
      `\\sigma_x &= \\frac{E}{1-\\nu^2}(\\varepsilon_x + \\nu\\varepsilon_y) = ${k}\\left(${plain(v('ex'))} + ${nu}\\cdot${plain(v('ey'))}\\right) = ${texQuantity(v('sx'), 'stress', sys)}`,
    );
    lines.push(
      `\\sigma_y &= \\frac{E}{1-\\nu^2}(\\varepsilon_y + \\nu\\varepsilon_x) = ${k}\\left(${plain(v('ey'))} + ${nu}\\cdot${plain(v('ex'))}\\right) = ${texQuantity(v('sy'), 'stress', sys)}`,
    );
    lines.push(
      `\\tau_{xy} &= \\frac{E}{2(1+\\nu)}\\gamma_{xy} = \\frac{${E}}{2(1+${nu})}\\cdot${plain(v('gxy'))} = ${texQuantity(v('txy'), 'stress', sys)}`,
    );
    return `\\begin{aligned}${lines.join(' \\\\ ')}\\end{aligned}`;
  },
};
