import { Link, useParams, useSearchParams } from 'react-router-dom';
import { useRevisionDiff, useRevisions } from '../api/revisions';
import { useSheet } from '../api/sheets';
import { ErrorPanel } from '../components/ErrorPanel';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { SelectField } from '../components/SelectField';
import { RevisionDiffView } from '../features/review/RevisionDiffView';
import { RevisionTable } from '../features/review/RevisionTable';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/**
 * /sheets/:sheetId/revisions — the issued revisions of a sheet and what changed between any two
 * of them (or between one and the sheet as it is now). The pair is in the address
 * (`?from=1&to=2`), so a comparison can be linked to.
 */
export function RevisionsPage() {
  const { sheetId = '' } = useParams();
  const sheet = useSheet(sheetId);
  const revisions = useRevisions(sheetId);
  const [params, setParams] = useSearchParams();
  useDocumentTitle(sheet.data ? `Revisions of ${sheet.data.sheet.calcNumber}` : 'Revisions');

  const list = revisions.data ?? [];
  const newest = list[0]?.number ?? null;
  const defaultFrom = list.length >= 2 ? (list[1]?.number ?? null) : newest;
  const defaultTo: number | 'current' | null = list.length >= 2 ? newest : newest === null ? null : 'current';
  const from = numberParam(params.get('from')) ?? defaultFrom;
  const toParam = params.get('to');
  const to: number | 'current' | null = toParam === 'current' ? 'current' : (numberParam(toParam) ?? defaultTo);
  const diff = useRevisionDiff(sheetId, from, to);

  if (!sheet.data) return <Loading what="the sheet" />;
  const { calcNumber, title } = sheet.data.sheet;
  const label = (value: number | 'current') => (value === 'current' ? 'the sheet now' : `revision ${value}`);
  const choose = (key: 'from' | 'to', value: string) => {
    const next = new URLSearchParams(params);
    next.set('from', String(from ?? ''));
    next.set('to', String(to ?? ''));
    next.set(key, value);
    setParams(next, { replace: true });
  };

  return (
    <Paper className="mx-auto max-w-[64rem]">
      <PageHeader
        title={`Revisions of ${calcNumber}`}
        subtitle={title}
        actions={
          <>
            <Link className="btn" to={`/sheets/${sheetId}`}>
              Back to the sheet
            </Link>
            <Link className="btn" to={`/sheets/${sheetId}/history`}>
              History
            </Link>
          </>
        }
      />
      {revisions.isError ? <ErrorPanel error={revisions.error} what="the revisions" /> : null}
      {revisions.data ? <RevisionTable sheetId={sheetId} revisions={list} /> : <Loading what="the revisions" />}

      {from !== null && to !== null ? (
        <section aria-labelledby="compare-heading" className="mt-6">
          <h2 id="compare-heading" className="mb-2 text-[1rem]">
            What changed
          </h2>
          <div className="mb-4 flex flex-wrap gap-3">
            <SelectField label="From" name="from" value={String(from)} onChange={(event) => choose('from', event.target.value)}>
              {list.map((r) => (
                <option key={r.number} value={r.number}>
                  revision {r.number}
                </option>
              ))}
            </SelectField>
            <SelectField label="To" name="to" value={String(to)} onChange={(event) => choose('to', event.target.value)}>
              {list.map((r) => (
                <option key={r.number} value={r.number}>
                  revision {r.number}
                </option>
              ))}
              <option value="current">the sheet now</option>
            </SelectField>
          </div>
          {diff.isError ? <ErrorPanel error={diff.error} what="the comparison" /> : null}
          {diff.data ? (
            <RevisionDiffView diff={diff.data.diff} fromLabel={label(from)} toLabel={label(to)} />
          ) : diff.isLoading ? (
            <Loading what="the comparison" />
          ) : null}
        </section>
      ) : null}
    </Paper>
  );
}

function numberParam(value: string | null): number | null {
  if (value === null || !/^\d+$/.test(value)) return null;
  const n = Number(value);
  return n >= 1 ? n : null;
}
