import { Link, useParams } from 'react-router-dom';
import { useRevision } from '../api/revisions';
import { useSheet } from '../api/sheets';
import { Loading } from '../components/Loading';
import { Paper } from '../components/Paper';
import { PrintPageMargins } from '../components/PrintPageMargins';
import { PrintPages } from '../components/PrintPages';
import { TitleBlock } from '../components/TitleBlock';
import { RevisionDocument } from '../features/document/RevisionDocument';
import { usePrintEquationFit } from '../features/sheet/hooks/usePrintEquationFit';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { useProjectOrganization } from '../hooks/useProjectOrganization';

/**
 * /sheets/:sheetId/revisions/:number — one issued revision as a document, read-only: the title
 * block with the signatures it was issued with, then the calculation as issued (see
 * RevisionDocument). Printed, the title block heads every page and the foot of each page carries
 * the calc number, the revision, its content hash and the page number.
 */
export function RevisionPage() {
  const { sheetId = '', number = '' } = useParams();
  const revisionNumber = /^\d+$/.test(number) ? Number(number) : 0;
  const sheet = useSheet(sheetId);
  const revision = useRevision(sheetId, revisionNumber);
  const owner = useProjectOrganization(sheet.data?.sheet.projectId);
  usePrintEquationFit();
  useDocumentTitle(sheet.data ? `${sheet.data.sheet.calcNumber} rev. ${number}` : 'Revision');

  if (!sheet.data || !revision.data) return <Loading what={`revision ${number}`} />;
  const r = revision.data;
  const current = sheet.data.sheet;
  const organizationName = owner === undefined ? '…' : (owner?.organization.name ?? '—');
  const superseded = r.supersededAt !== null;

  return (
    <Paper className="mx-auto max-w-[72rem]">
      <PrintPageMargins
        topCenter={superseded ? `Superseded by revision ${r.number + 1}: not the current issue` : undefined}
        bottomLeft={`${current.calcNumber} rev. ${r.number} · ${superseded ? 'superseded' : 'approved'} · content sha-256 ${r.contentSha256}`}
        bottomRight="Page {page} of {pages}"
      />
      <PrintPages
        head={
          <TitleBlock
            sheet={{ ...current, title: r.title, revision: r.number, status: r.status }}
            organizationName={organizationName}
            signatures={{
              prepared: { name: r.prepared.user.name, at: r.prepared.at },
              checked: { name: r.checked.user.name, at: r.checked.at },
              approved: { name: r.approved.user.name, at: r.approved.at },
            }}
          />
        }
      >
        <nav aria-label="Revision" className="no-print mb-3 flex flex-wrap justify-end gap-2 border-b border-paper-rule pb-3">
          <button type="button" className="btn" onClick={() => window.print()}>
            Print…
          </button>
          {r.number > 1 ? (
            <Link className="btn" to={`/sheets/${sheetId}/revisions?from=${r.number - 1}&to=${r.number}`}>
              Changes from revision {r.number - 1}
            </Link>
          ) : null}
          <Link className="btn" to={`/sheets/${sheetId}/revisions`}>
            All revisions
          </Link>
          <Link className="btn" to={`/sheets/${sheetId}`}>
            The sheet now
          </Link>
        </nav>
        <RevisionDocument sheetId={sheetId} revision={r} />
      </PrintPages>
    </Paper>
  );
}
