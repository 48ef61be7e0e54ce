import { texPlain, texQuantity, texTerm } from './latex';
import type { CellOk } from './result';
import type { UnitSystemId } from '../units/unitSystems';

/**
 * The substituted equation of a criterion result: the theory's formula with the principal
 * stresses and strengths put in, the factor, and the margin against the required factor.
 */
export function criterionTex(result: CellOk, system: UnitSystemId): string | null {
  const c = result.criterion;
  if (!c) return null;
  const v = result.values;
  const s1 = v.s1 as number;
  const s2 = v.s2 as number;
  const s3 = v.s3 as number;
  const n = (x: number) => texTerm(x, 'stress', system);
  const q = (x: number) => texQuantity(x, 'stress', system);
  const factor = v.factor === null ? '\\infty' : texPlain(v.factor as number, 4);
  const st = c.strength;
  let body: string;
  switch (c.theory) {
    case 'von-mises':
      body =
        `\\sigma' &= \\sqrt{\\tfrac{1}{2}\\left[(\\sigma_1-\\sigma_2)^2+(\\sigma_2-\\sigma_3)^2+(\\sigma_3-\\sigma_1)^2\\right]}` +
        ` = \\sqrt{\\tfrac{1}{2}\\left[(${n(s1)}-${n(s2)})^2+(${n(s2)}-${n(s3)})^2+(${n(s3)}-${n(s1)})^2\\right]} = ${q(v.equivalent as number)} \\\\ ` +
        `n &= \\frac{S_y}{\\sigma'} = \\frac{${n(st.Sy!)}}{${n(v.equivalent as number)}} = ${factor}`;
      break;
    case 'tresca':
      body =
        `\\sigma_1 - \\sigma_3 &= ${n(s1)} - ${n(s3)} = ${q(v.equivalent as number)} \\\\ ` +
        `n &= \\frac{S_y}{\\sigma_1-\\sigma_3} = \\frac{${n(st.Sy!)}}{${n(v.equivalent as number)}} = ${factor}`;
      break;
    case 'max-normal':
      body = `n &= \\min\\left(\\frac{S_{ut}}{\\sigma_1},\\ \\frac{S_{uc}}{-\\sigma_3}\\right) = \\min\\left(\\frac{${n(st.Sut!)}}{${n(s1)}},\\ \\frac{${n(st.Suc!)}}{${n(-s3)}}\\right) = ${factor}`;
      break;
    case 'coulomb-mohr':
      body =
        `\\frac{1}{n} &= \\frac{\\sigma_1}{S_{ut}} - \\frac{\\sigma_3}{S_{uc}} = \\frac{${n(s1)}}{${n(st.Sut!)}} - \\frac{${n(s3)}}{${n(st.Suc!)}}` +
        ` \\Rightarrow n = ${factor}`;
      break;
    case 'modified-mohr':
      body =
        s1 > 0 && s3 < 0 && -s3 > s1
          ? `\\frac{1}{n} &= \\frac{(S_{uc}-S_{ut})\\,\\sigma_1}{S_{uc}S_{ut}} - \\frac{\\sigma_3}{S_{uc}} = \\frac{(${n(st.Suc!)}-${n(st.Sut!)})\\,${n(s1)}}{${n(st.Suc!)}\\cdot ${n(st.Sut!)}} - \\frac{${n(s3)}}{${n(st.Suc!)}} \\Rightarrow n = ${factor}`
          : s1 > 0
            ? `n &= \\frac{S_{ut}}{\\sigma_1} = \\frac{${n(st.Sut!)}}{${n(s1)}} = ${factor}`
            : `n &= \\frac{S_{uc}}{-\\sigma_3} = \\frac{${n(st.Suc!)}}{${n(-s3)}} = ${factor}`;
      break;
    case 'mohr-coulomb': {
      const s = -(s1 + s3) / 2;
      const R = (s1 - s3) / 2;
      const tan = Math.tan(st.phi!);
      body =
        `s &= -\\frac{\\sigma_1+\\sigma_3}{2} = ${q(s)},\\quad R = \\frac{\\sigma_1-\\sigma_3}{2} = ${q(R)} \\\\ ` +
        `F &= \\sqrt{\\left(\\frac{c + s\\tan\\phi}{R}\\right)^2 - \\tan^2\\phi} = \\sqrt{\\left(\\frac{${n(st.c!)} + ${n(s)}\\cdot ${texPlain(tan)}}{${n(R)}}\\right)^2 - ${texPlain(tan)}^2} = ${factor}`;
      break;
    }
  }
  const margin = v.margin === null ? '\\infty' : texPlain(v.margin as number, 4);
  const verdict = v.pass ? '\\text{pass}' : '\\text{fail}';
  const tail = `\\text{margin} &= \\frac{n}{n_{req}} - 1 = \\frac{${factor}}{${texPlain(v.required as number)}} - 1 = ${margin}\\quad ${verdict}`;
  return `\\begin{aligned}${body} \\\\ ${tail}\\end{aligned}`;
}
