/**
 * The engine's one mathjs instance. Everything that parses or evaluates an expression goes
 * through here, so the restrictions below hold everywhere (see TECH-NOTES, "mathjs safely").
 *
 * - Plain JavaScript numbers (no BigNumber, no Fraction by default).
 * - Units of the trade: ksi and kpsi (1000 psi), Msi and Mpsi (10⁶ psi), and psi and kip
 *   (1000 lbf) redefined from the exact pound-force and inch.
 * - Functions that parse, evaluate, change the instance or draw random numbers are replaced by
 *   functions that throw, so an expression cannot call them. The engine keeps its own references
 *   to `parse` and `compile`, taken before the replacement.
 */
import { all, create, type EvalFunction, type FactoryFunctionMap, type MathNode, type Unit } from 'mathjs';

const math = create(all as FactoryFunctionMap, { number: 'number', predictable: true });

// From the exact definitions (1 lbf = 4.4482216152605 N, 1 in = 0.0254 m): mathjs rounds its
// built-in psi (6894.75729276459 Pa) and kip (4448.2216 N) to fewer digits.
math.createUnit(
  {
    psi: '1 lbf / in^2',
    ksi: '1000 lbf / in^2',
    kpsi: '1000 lbf / in^2',
    Msi: '1e6 lbf / in^2',
    Mpsi: '1e6 lbf / in^2',
    kip: '1000 lbf',
  },
  { override: true },
);

const parseExpression: (text: string) => MathNode = math.parse.bind(math);
const compileNode = (node: MathNode): EvalFunction => node.compile();

/** Names an expression may not call: they parse, evaluate, change the instance or are random. */
export const BLOCKED_FUNCTIONS = [
  'import',
  'createUnit',
  'evaluate',
  'parse',
  'simplify',
  'derivative',
  'resolve',
  'reviver',
  'replacer',
  'compile',
  'parser',
  'config',
  'chain',
  'rationalize',
  'simplifyConstant',
  'simplifyCore',
  'symbolicEqual',
  'leafCount',
  'help',
  'random',
  'randomInt',
  'pickRandom',
] as const;

const blocked: Record<string, () => never> = {};
for (const name of BLOCKED_FUNCTIONS) {
  blocked[name] = () => {
    throw new Error(`${name} is not available in sheet expressions`);
  };
}
math.import(blocked, { override: true });

const blockedSet = new Set<string>(BLOCKED_FUNCTIONS);

/**
 * Constants an expression may name without a cell of that name. Others that mathjs knows (tau,
 * phi, i, E, ...) are left out on purpose: `phi` or `tau` in a stress sheet almost surely means
 * a cell the author forgot, and must be reported as an unknown name, not read as a number.
 */
export const ALLOWED_CONSTANTS: ReadonlySet<string> = new Set(['pi', 'e', 'Infinity']);

/** True when `name` is a unit mathjs knows (with or without prefix), e.g. `MPa`, `kip`, `deg`. */
export function isUnitName(name: string): boolean {
  return math.Unit.isValuelessUnit(name);
}

/** True when `name` is a function an expression may call (`sqrt`, `max`, `atan2`, ...). */
export function isCallableFunction(name: string): boolean {
  if (blockedSet.has(name)) return false;
  const value = (math as unknown as Record<string, unknown>)[name];
  return typeof value === 'function' && !/^[A-Z]/.test(name);
}

/** True for the mathjs Unit type. */
export function isUnit(value: unknown): value is Unit {
  return math.isUnit(value);
}

const templates = new Map<string, Unit>();

/** A mathjs Unit holding `valueSI` in the given SI base unit string (e.g. `kg m^-1 s^-2`). */
export function unitFromSI(valueSI: number, baseUnit: string): Unit {
  // Parsing a unit string costs ten times a clone: parse each base unit once.
  let template = templates.get(baseUnit);
  if (!template) {
    template = math.unit(baseUnit);
    templates.set(baseUnit, template);
  }
  const u = template.clone();
  // mathjs keeps a Unit's value in SI base units internally; setting it keeps full precision.
  (u as unknown as { value: number }).value = valueSI;
  return u;
}

/** The SI value of `amount` of unit `unitName` (e.g. 1 ksi in Pa). */
export function siValueOf(amount: number, unitName: string): number {
  const v = (math.unit(amount, unitName) as unknown as { value: number | null }).value;
  if (v === null) throw new Error(`unit ${unitName} has no value`);
  return v;
}

export { compileNode, math, parseExpression };
