import { useRef } from 'react';
import { Link, useParams } from 'react-router-dom';
import { useRevision } from '../api/revisions';
import { useSheet } from '../api/sheets';
import { Loading } from '../components/Loading';
import { Paper } from '../components/Paper';
import { TitleBlock } from '../components/TitleBlock';
import { NotesRail } from '../features/review/NotesRail';
import { FrozenMaterialsList } from '../features/materials/FrozenMaterialsList';
import { RevisionCells } from '../features/review/RevisionCells';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { useProjectOrganization } from '../hooks/useProjectOrganization';
import { formatDateTime } from '../lib/formatDateTime';

/**
 * /sheets/:sheetId/revisions/:number — one issued revision, read-only: its title block with the
 * signatures it was issued with, its cells and results as issued, and the notes made on it.
 */
export function RevisionPage() {
  const { sheetId = '', number = '' } = useParams();
  const revisionNumber = /^\d+$/.test(number) ? Number(number) : 0;
  const sheet = useSheet(sheetId);
  const revision = useRevision(sheetId, revisionNumber);
  const owner = useProjectOrganization(sheet.data?.sheet.projectId);
  const cells = useRef<HTMLOListElement>(null);
  useDocumentTitle(sheet.data ? `${sheet.data.sheet.calcNumber} rev. ${number}` : 'Revision');

  if (!sheet.data || !revision.data) return <Loading what={`revision ${number}`} />;
  const r = revision.data;
  const current = sheet.data.sheet;
  const organizationName = owner === undefined ? '…' : (owner?.organization.name ?? '—');
  const cellLabels = Object.fromEntries(
    r.content.cells.map((cell, index) => [cell.id, typeof cell.name === 'string' && cell.name ? cell.name : `${cell.kind} ${index + 1}`]),
  );

  return (
    <Paper className="mx-auto max-w-[80rem]">
      <TitleBlock
        sheet={{ ...current, title: r.title, revision: r.number, status: r.status }}
        organizationName={organizationName}
        signatures={{
          prepared: { name: r.prepared.user.name, at: r.prepared.at },
          checked: { name: r.checked.user.name, at: r.checked.at },
          approved: { name: r.approved.user.name, at: r.approved.at },
        }}
      />
      <div role="note" className="mb-4 flex flex-wrap items-baseline justify-between gap-3 border-b border-paper-rule pb-3 text-[0.875rem]">
        <p>
          Read-only: revision {r.number} as issued on <span className="font-mono">{formatDateTime(r.approved.at)}</span>
          {r.supersededAt ? (
            <>
              , superseded on <span className="font-mono">{formatDateTime(r.supersededAt)}</span>
            </>
          ) : null}
          . Content sha-256 <span className="font-mono break-all">{r.contentSha256}</span>
          {r.overrideReason ? <>. Approved over open notes: “{r.overrideReason}”</> : null}.
        </p>
        <span className="flex flex-wrap gap-2">
          {r.number > 1 ? (
            <Link className="btn" to={`/sheets/${sheetId}/revisions?from=${r.number - 1}&to=${r.number}`}>
              Changes from revision {r.number - 1}
            </Link>
          ) : null}
          <Link className="btn" to={`/sheets/${sheetId}`}>
            The sheet now
          </Link>
        </span>
      </div>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <section aria-label={`Cells of revision ${r.number}`}>
          <RevisionCells ref={cells} revision={r} />
          <FrozenMaterialsList materials={r.materials} />
        </section>
        <NotesRail sheetId={sheetId} cellIds={r.content.cells.map((c) => c.id)} cellLabels={cellLabels} cellsRef={cells} revision={r.number} />
      </div>
    </Paper>
  );
}
