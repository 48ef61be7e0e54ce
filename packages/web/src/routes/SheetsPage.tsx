import { useEffect, useRef, useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { useOrganizationSheets } from '../api/sheets';
import { can, type Membership, type SheetStatus } from '../api/types';
import { ErrorPanel } from '../components/ErrorPanel';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { RequireOrganization } from '../components/RequireOrganization';
import { SheetsTable } from '../components/SheetsTable';
import { StatusFilter } from '../components/StatusFilter';
import { useDebouncedValue } from '../hooks/useDebouncedValue';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { isSheetStatus, STATUS_LABEL } from '../lib/sheetStatus';

/** /sheets — every sheet of the current organization, searchable, narrowed by status. */
export function SheetsPage() {
  useDocumentTitle('Sheets');
  return (
    <RequireOrganization>
      {(membership) => <SheetRegister membership={membership} />}
    </RequireOrganization>
  );
}

function SheetRegister({ membership }: { membership: Membership }) {
  // The search and the status live in the URL, so a filtered list can be bookmarked and shared.
  const [params, setParams] = useSearchParams();
  const urlQuery = params.get('q') ?? '';
  const statusParam = params.get('status');
  const status: SheetStatus | null = isSheetStatus(statusParam) ? statusParam : null;

  const [typed, setTyped] = useState(urlQuery);
  const debounced = useDebouncedValue(typed.trim(), 250);

  // The URL changed from outside the box (back button, a link to /sheets): show its search.
  const [seenUrlQuery, setSeenUrlQuery] = useState(urlQuery);
  if (urlQuery !== seenUrlQuery) {
    setSeenUrlQuery(urlQuery);
    if (urlQuery !== typed.trim()) setTyped(urlQuery);
  }

  // What was typed reaches the URL once typing pauses.
  const lastWritten = useRef(debounced);
  useEffect(() => {
    if (debounced === lastWritten.current) return;
    lastWritten.current = debounced;
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        if (debounced) next.set('q', debounced);
        else next.delete('q');
        return next;
      },
      { replace: true },
    );
  }, [debounced, setParams]);

  function onStatus(value: SheetStatus | null) {
    setParams((current) => {
      const next = new URLSearchParams(current);
      if (value) next.set('status', value);
      else next.delete('status');
      return next;
    });
  }

  const filter = { q: urlQuery || undefined, status: status ?? undefined };
  const sheets = useOrganizationSheets(membership.organization.id, filter);
  const filtered = Boolean(urlQuery || status);

  return (
    <Paper>
      <PageHeader
        title="Sheets"
        subtitle={`Calculation sheets of ${membership.organization.name}`}
        actions={
          can(membership.role, 'sheet.create') ? (
            <Link to="/projects" className="btn">
              New sheet in a project
            </Link>
          ) : undefined
        }
      />
      <div
        role="search"
        aria-label="Find sheets"
        className="mb-4 flex flex-wrap items-end gap-x-6 gap-y-3"
      >
        <div className="w-full max-w-xs">
          <label htmlFor="sheet-search" className="mb-1 block font-medium">
            Search
          </label>
          <input
            id="sheet-search"
            type="search"
            className="input"
            placeholder="Title or calc number"
            value={typed}
            onChange={(e) => setTyped(e.target.value)}
          />
        </div>
        <StatusFilter value={status} onChange={onStatus} />
      </div>

      {sheets.isPending ? (
        <Loading what="sheets" />
      ) : sheets.isError ? (
        <ErrorPanel error={sheets.error} what="the sheets" />
      ) : sheets.data.length === 0 ? (
        <p className="py-6 text-ink-muted">
          {filtered
            ? `No sheet matches${urlQuery ? ` “${urlQuery}”` : ''}${status ? ` with status ${STATUS_LABEL[status]}` : ''}.`
            : 'No sheets yet. Open a project to start the first one.'}
        </p>
      ) : (
        <>
          <p className="mb-2 text-[0.8125rem] text-ink-muted" aria-live="polite">
            {sheets.data.length} {sheets.data.length === 1 ? 'sheet' : 'sheets'}
            {sheets.isFetching ? ' · updating…' : ''}
          </p>
          <SheetsTable sheets={sheets.data} caption={`Sheets of ${membership.organization.name}`} />
        </>
      )}
    </Paper>
  );
}
