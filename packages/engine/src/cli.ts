/**
 * The engine's command line (the only engine file that touches Node):
 *
 *   sheaf eval FILE [--json] [--units SI|US] [--materials FILE]
 *   sheaf batch CSV --theory T [--Sy S] [--Sut S --Suc S] [--c S --phi A] [--unit MPa] [--required N] [--json]
 *
 * Exit status: 0 when the file is valid (cells with errors are reported, not fatal), 1 when the
 * file itself is invalid (the message names the field), 2 on bad usage.
 */
import { readFileSync } from 'node:fs';
import { parseStressCsv } from './batch/csv';
import { evaluatePointSet } from './batch/pointSet';
import { THEORIES, isTheoryId } from './criteria/theories';
import { THEORY_IDS, type Strength, type StrengthKey } from './criteria/types';
import { readSheet } from './format/readSheet';
import type { Material } from './kinds/materials';
import { createEvaluator } from './sheet/createEvaluator';
import { formatResult } from './sheet/formatResult';
import { machineOutput } from './sheet/machineOutput';
import { checkDimension } from './units/checkDimension';
import { evaluateExpression, isExpressionProblem } from './units/expression';
import { formatNumber } from './units/formatQuantity';
import { isUnitSystemId, type UnitSystemId } from './units/unitSystems';

const USAGE = `usage:
  sheaf eval FILE [--json] [--units SI|US] [--materials FILE]
  sheaf batch CSV --theory ${THEORY_IDS.join('|')} [--Sy S] [--Sut S --Suc S] [--c S --phi A]
              [--unit MPa] [--required N] [--json]

eval   evaluates a sheet file and prints every named cell's results
       (--json: numbers in SI base units; --units: display units, default the sheet's own)
batch  checks every row of a CSV with columns sx,sy,txy[,sz,tyz,tzx] (numbers in --unit,
       default MPa) against a theory; strengths are numbers in --unit (phi in degrees) or
       quantities with units such as 36ksi or "30 deg"

exit status: 0 valid file, 1 invalid file, 2 bad usage`;

const CAUTION =
  'Results support, not replace, the judgement of a qualified engineer; verify them against the governing codes.';

class UsageError extends Error {}

interface Options {
  readonly positional: string[];
  readonly flags: Map<string, string | true>;
}

/** Split arguments into positionals and `--name value` / `--flag` options. */
function parseArgs(args: readonly string[], valueOptions: ReadonlySet<string>, flagOptions: ReadonlySet<string>): Options {
  const positional: string[] = [];
  const flags = new Map<string, string | true>();
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (!arg.startsWith('--')) {
      positional.push(arg);
      continue;
    }
    const [name, inline] = arg.slice(2).split('=', 2) as [string, string | undefined];
    if (flagOptions.has(name)) {
      flags.set(name, true);
    } else if (valueOptions.has(name)) {
      const value = inline ?? args[++i];
      if (value === undefined) throw new UsageError(`--${name} needs a value`);
      flags.set(name, value);
    } else {
      throw new UsageError(`unknown option --${name}`);
    }
  }
  return { positional, flags };
}

function readText(path: string, what: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (err) {
    throw new UsageError(`cannot read ${what} ${path}: ${(err as NodeJS.ErrnoException).code ?? String(err)}`);
  }
}

function out(text: string): void {
  process.stdout.write(`${text}\n`);
}

function fail(text: string): void {
  process.stderr.write(`${text}\n`);
}

function runEval(args: readonly string[]): number {
  const { positional, flags } = parseArgs(args, new Set(['units', 'materials']), new Set(['json']));
  if (positional.length !== 1) throw new UsageError('eval needs exactly one FILE');
  const units = flags.get('units');
  if (units !== undefined && (units === true || !isUnitSystemId(units))) throw new UsageError('--units must be SI or US');
  let materials: Record<string, Material> | undefined;
  const materialsPath = flags.get('materials');
  if (typeof materialsPath === 'string') {
    try {
      materials = JSON.parse(readText(materialsPath, 'materials file')) as Record<string, Material>;
    } catch (err) {
      if (err instanceof UsageError) throw err;
      fail(`${materialsPath}: JSON: ${(err as Error).message}`);
      return 1;
    }
  }
  const path = positional[0]!;
  const read = readSheet(readText(path, 'sheet'));
  if (!read.ok) {
    for (const e of read.errors) fail(`${path}: ${e}`);
    return 1;
  }
  const sheet = read.sheet;
  const evaluator = createEvaluator(sheet, materials ? { materials } : {});
  if (flags.has('json')) {
    out(JSON.stringify(machineOutput(evaluator.cells, evaluator.results), null, 2));
    return 0;
  }
  const system: UnitSystemId = typeof units === 'string' && isUnitSystemId(units) ? units : sheet.unitSystem;
  out(`${sheet.title || path}  (${system} units)`);
  const named = sheet.cells.filter((c) => 'name' in c) as { id: string; kind: string; name: string }[];
  const width = Math.max(4, ...named.map((c) => c.name.length));
  let failed = 0;
  for (const cell of named) {
    const result = evaluator.results.get(cell.id)!;
    const head = `${cell.name.padEnd(width)}  ${cell.kind.padEnd(9)}`;
    if (!result.ok) {
      failed++;
      out(`${head}  ERROR ${result.error.code}: ${result.error.message}`);
      continue;
    }
    const formatted = formatResult(result, system);
    const parts = Object.entries(formatted)
      .filter(([key]) => key !== 'unbounded' && !/^n[123]$/.test(key) && key !== 'factors')
      .map(([key, f]) => `${key} = ${f.text}`);
    out(`${head}  ${parts.join(', ')}`);
  }
  out(`${named.length} named cells, ${failed} with errors`);
  out(CAUTION);
  return 0;
}

/** A strength option: a bare number in `unit` (phi: degrees) or an expression with units. */
function strengthOption(key: StrengthKey, raw: string, unit: string): number {
  const bare = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(raw.trim());
  const text = bare ? `${raw} ${key === 'phi' ? 'deg' : unit}` : raw;
  const q = evaluateExpression(text, new Map());
  if (isExpressionProblem(q)) throw new UsageError(`--${key}: ${q.message}`);
  const mismatch = checkDimension(`--${key}`, q.dim, key === 'phi' ? 'angle' : 'pressure');
  if (mismatch) throw new UsageError(mismatch);
  return q.si;
}

function runBatch(args: readonly string[]): number {
  const { positional, flags } = parseArgs(args, new Set(['theory', 'Sy', 'Sut', 'Suc', 'c', 'phi', 'unit', 'required']), new Set(['json']));
  if (positional.length !== 1) throw new UsageError('batch needs exactly one CSV file');
  const theory = flags.get('theory');
  if (typeof theory !== 'string' || !isTheoryId(theory)) throw new UsageError(`--theory must be one of ${THEORY_IDS.join(', ')}`);
  const unit = (flags.get('unit') as string | undefined) ?? 'MPa';
  const perUnit = evaluateExpression(`1 ${unit}`, new Map());
  if (!/^[A-Za-z]+$/.test(unit) || isExpressionProblem(perUnit) || checkDimension('--unit', perUnit.dim, 'pressure')) {
    throw new UsageError(`--unit must be a pressure unit such as MPa, ksi or Pa (got ${unit})`);
  }
  const strength: Partial<Record<StrengthKey, number>> = {};
  for (const key of THEORIES[theory].needs) {
    const raw = flags.get(key);
    if (typeof raw !== 'string') throw new UsageError(`--theory ${theory} needs --${key}`);
    strength[key] = strengthOption(key, raw, unit);
  }
  const problem = THEORIES[theory].validate(strength as Strength);
  if (problem) throw new UsageError(`--${problem.key}: ${problem.message}`);
  const requiredRaw = flags.get('required');
  const required = requiredRaw === undefined ? 1 : Number(requiredRaw);
  if (!(Number.isFinite(required) && required > 0)) throw new UsageError('--required must be a positive number');

  const path = positional[0]!;
  const csv = parseStressCsv(readText(path, 'CSV file'), perUnit.si);
  if (!csv.ok) {
    fail(`${path}: ${csv.message}`);
    return 1;
  }
  const outcome = evaluatePointSet(theory, csv.columns, strength as Strength, required);
  const unbounded = outcome.minFactor === Infinity;
  if (flags.has('json')) {
    const minFactor = Number.isFinite(outcome.minFactor) ? outcome.minFactor : null;
    const body = {
      count: outcome.count,
      minFactor,
      ...(unbounded ? { unbounded: true } : {}),
      worstRow: outcome.worstRow,
      failing: outcome.failing,
      required,
    };
    out(JSON.stringify(body, null, 2));
    return 0;
  }
  out(`${path}: ${theory}, numbers in ${unit}`);
  out(`count: ${outcome.count}`);
  out(`minimum factor: ${outcome.count === 0 ? '—' : unbounded ? 'unbounded' : formatNumber(outcome.minFactor)}`);
  out(`worst row: ${outcome.worstRow < 0 ? '—' : `${outcome.worstRow} (0-based data row; line ${csv.lines[outcome.worstRow]} of the file)`}`);
  out(`failing (factor < ${formatNumber(required)}): ${outcome.failing}`);
  out(CAUTION);
  return 0;
}

/** Run the CLI with arguments (without node and script); returns the exit status. */
export function main(args: readonly string[]): number {
  const [command, ...rest] = args;
  try {
    if (command === 'eval') return runEval(rest);
    if (command === 'batch') return runBatch(rest);
    if (command === '--help' || command === '-h' || command === 'help') {
      out(USAGE);
      return 0;
    }
    throw new UsageError(command === undefined ? 'no command given' : `unknown command ${command}`);
  } catch (err) {
    if (err instanceof UsageError) {
      fail(`sheaf: ${err.message}\n${USAGE}`);
      return 2;
    }
    throw err;
  }
}

process.exitCode = main(process.argv.slice(2));
