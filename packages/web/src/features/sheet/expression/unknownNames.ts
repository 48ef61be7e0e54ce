import { isFreeStandingSymbol } from '@sheaf/engine';
import { identifierTokens } from './expressionTokens';

/** A name in an expression that no cell has and that is not a unit or constant. */
export interface UnknownNameRange {
  name: string;
  from: number;
  to: number;
}

/**
 * The names an expression uses that the sheet cannot resolve, with where they are, by the same
 * rule as the engine's dependency graph: a name is a cell when a cell has it (a cell shadows a
 * unit of the same name); otherwise it is fine when it is a unit or an allowed constant (`pi`,
 * `e`); anything else is unknown. Function names and values after a dot (`P.s1`) are left to
 * the evaluator, which reports them by field.
 * @example unknownNames('F / A_weld', new Set(['F'])) // [{ name: 'A_weld', from: 4, to: 10 }]
 */
export function unknownNames(text: string, cellNames: ReadonlySet<string>): UnknownNameRange[] {
  return identifierTokens(text)
    .filter((t) => t.role === 'symbol' && !cellNames.has(t.name) && !isFreeStandingSymbol(t.name))
    .map(({ name, from, to }) => ({ name, from, to }));
}

/** The names an expression uses that are cells of the sheet, with where they are. */
export function cellReferences(text: string, cellNames: ReadonlySet<string>): UnknownNameRange[] {
  return identifierTokens(text)
    .filter((t) => t.role === 'symbol' && cellNames.has(t.name))
    .map(({ name, from, to }) => ({ name, from, to }));
}
