import type { RevisionDiffResponse } from '@sheaf/engine/api';
import { VerdictShape } from '../../components/VerdictShape';
import { resultLabel } from './resultLabels';

type Diff = RevisionDiffResponse['diff'];
type ResultRow = Diff['results'][number];

/**
 * What changed between two revisions: first the checks whose verdict crossed between pass and
 * fail (shape and word, never colour alone), then the cells added, removed and changed with each
 * input's old and new text, then every result that moved with its old and new value in units.
 */
export function RevisionDiffView({ diff, fromLabel, toLabel }: { diff: Diff; fromLabel: string; toLabel: string }) {
  const changedCells = diff.added.length + diff.removed.length + diff.changed.length;
  const nothing = changedCells === 0 && diff.results.length === 0 && diff.sheet.length === 0;
  return (
    <div className="grid gap-5">
      <p aria-live="polite">
        {nothing
          ? `No differences between ${fromLabel} and ${toLabel}.`
          : `${count(diff.added.length, 'cell')} added, ${diff.removed.length} removed, ${diff.changed.length} changed; ${count(diff.results.length, 'result value')} moved; ${count(diff.crossings.length, 'check')} crossed between pass and fail.`}
      </p>

      {diff.crossings.length > 0 ? (
        <section aria-labelledby="crossings-heading">
          <h3 id="crossings-heading" className="mb-2 text-[0.9375rem]">
            Checks that crossed between pass and fail
          </h3>
          <ul className="grid gap-2">
            {diff.crossings.map((crossing) => {
              const factor = diff.results.find((r) => r.cellId === crossing.cellId && (r.key === 'factor' || r.key === 'minFactor'));
              const failing = crossing.direction === 'pass-to-fail';
              return (
                <li
                  key={crossing.cellId}
                  className={`flex flex-wrap items-center gap-x-3 gap-y-1 rounded-[3px] border-2 bg-white px-3 py-2 ${failing ? 'border-fail' : 'border-pass'}`}
                >
                  <span className={`inline-flex items-center gap-1.5 font-semibold ${failing ? 'text-fail' : 'text-pass'}`}>
                    <VerdictShape verdict={failing ? 'fail' : 'pass'} />
                    {failing ? 'Now fails' : 'Now passes'}
                  </span>
                  <span className="font-mono font-medium">{crossing.cellName}</span>
                  <span className="text-ink-muted">
                    was {crossing.from}, is {crossing.to}
                    {factor?.old && factor.new ? (
                      <>
                        {' '}
                        — factor of safety <span className="font-mono text-ink">{factor.old.text}</span> →{' '}
                        <span className="font-mono text-ink">{factor.new.text}</span>
                      </>
                    ) : null}
                  </span>
                </li>
              );
            })}
          </ul>
        </section>
      ) : null}

      {changedCells > 0 || diff.sheet.length > 0 ? (
        <section aria-labelledby="inputs-heading">
          <h3 id="inputs-heading" className="mb-2 text-[0.9375rem]">
            Cells and inputs
          </h3>
          <table className="ruled">
            <thead>
              <tr>
                <th scope="col">Cell</th>
                <th scope="col">Change</th>
                <th scope="col">Field</th>
                <th scope="col">{fromLabel}</th>
                <th scope="col">{toLabel}</th>
              </tr>
            </thead>
            <tbody>
              {diff.sheet.map((change) => (
                <tr key={`sheet-${change.field}`}>
                  <td>Sheet</td>
                  <td>Changed</td>
                  <td className="font-mono">{change.field}</td>
                  <td className="font-mono break-words">{change.old ?? '—'}</td>
                  <td className="font-mono break-words">{change.new ?? '—'}</td>
                </tr>
              ))}
              {diff.added.map((cell) => (
                <tr key={`added-${cell.id}`}>
                  <CellName name={cell.name} kind={cell.kind} id={cell.id} />
                  <td>
                    <ChangeWord word="Added" sign="+" />
                  </td>
                  <td colSpan={3} className="text-ink-muted">
                    new {cell.kind} cell, number {cell.index + 1}
                  </td>
                </tr>
              ))}
              {diff.removed.map((cell) => (
                <tr key={`removed-${cell.id}`}>
                  <CellName name={cell.name} kind={cell.kind} id={cell.id} />
                  <td>
                    <ChangeWord word="Removed" sign="−" />
                  </td>
                  <td colSpan={3} className="text-ink-muted">
                    was {cell.kind} cell number {cell.index + 1}
                  </td>
                </tr>
              ))}
              {diff.changed.flatMap((cell) => [
                ...cell.inputs.map((input, index) => (
                  <tr key={`changed-${cell.id}-${input.field}`}>
                    {index === 0 ? <CellName name={cell.name} kind={cell.kind} id={cell.id} rowSpan={cell.inputs.length + (cell.moved ? 1 : 0)} /> : null}
                    <td>
                      <ChangeWord word="Changed" sign="~" />
                    </td>
                    <td className="font-mono">{input.field}</td>
                    <td className="font-mono break-words">{input.old ?? '—'}</td>
                    <td className="font-mono break-words">{input.new ?? '—'}</td>
                  </tr>
                )),
                ...(cell.moved
                  ? [
                      <tr key={`moved-${cell.id}`}>
                        {cell.inputs.length === 0 ? <CellName name={cell.name} kind={cell.kind} id={cell.id} /> : null}
                        <td>
                          <ChangeWord word="Moved" sign="↕" />
                        </td>
                        <td className="text-ink-muted">place</td>
                        <td className="font-mono">{cell.oldIndex + 1}</td>
                        <td className="font-mono">{cell.index + 1}</td>
                      </tr>,
                    ]
                  : []),
              ])}
            </tbody>
          </table>
        </section>
      ) : null}

      {diff.results.length > 0 ? (
        <section aria-labelledby="results-heading">
          <h3 id="results-heading" className="mb-2 text-[0.9375rem]">
            Results that moved
          </h3>
          <table className="ruled">
            <thead>
              <tr>
                <th scope="col">Cell</th>
                <th scope="col">Value</th>
                <th scope="col">{fromLabel}</th>
                <th scope="col">{toLabel}</th>
                <th scope="col">
                  <span className="sr-only">Verdict change</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {diff.results.map((row) => (
                <ResultRowView key={`${row.cellId}-${row.key ?? 'outcome'}`} row={row} />
              ))}
            </tbody>
          </table>
        </section>
      ) : null}
    </div>
  );
}

function ResultRowView({ row }: { row: ResultRow }) {
  const label = row.key === null ? 'result' : resultLabel(row.key);
  const failing = row.crossing === 'pass-to-fail';
  const crossing = row.crossing !== null;
  return (
    <tr className={crossing ? (failing ? 'bg-white outline-2 -outline-offset-2 outline-fail' : 'bg-white outline-2 -outline-offset-2 outline-pass') : undefined}>
      <td className="font-mono font-medium">{row.cellName}</td>
      <td>
        {row.key !== null ? <span className="font-mono">{row.key}</span> : null}
        {label ? <span className="ml-1.5 text-ink-muted">{label}</span> : null}
      </td>
      <td className="font-mono break-words">{row.old?.text ?? '—'}</td>
      <td className={`font-mono break-words ${crossing ? 'font-semibold' : ''}`}>{row.new?.text ?? '—'}</td>
      <td>
        {crossing ? (
          <span className={`inline-flex items-center gap-1 font-semibold ${failing ? 'text-fail' : 'text-pass'}`}>
            <VerdictShape verdict={failing ? 'fail' : 'pass'} />
            {failing ? 'Pass → fail' : 'Fail → pass'}
          </span>
        ) : null}
      </td>
    </tr>
  );
}

function CellName({ name, kind, id, rowSpan }: { name: string | null; kind: string; id: string; rowSpan?: number }) {
  return (
    <td rowSpan={rowSpan} className="align-top">
      <span className="font-mono font-medium">{name ?? kind}</span>
      <span className="ml-1.5 font-mono text-[0.75rem] text-ink-faint">id {id}</span>
    </td>
  );
}

/** A change kind as a sign and a word (the sign is decoration; the word carries it). */
function ChangeWord({ word, sign }: { word: string; sign: string }) {
  return (
    <span className="inline-flex items-center gap-1">
      <span aria-hidden="true" className="inline-block w-3 text-center font-mono font-semibold">
        {sign}
      </span>
      {word}
    </span>
  );
}

function count(n: number, noun: string): string {
  return `${n} ${noun}${n === 1 ? '' : 's'}`;
}
