import { Link } from 'react-router-dom';
import type { RevisionSummary } from '@sheaf/engine/api';
import { StatusBadge } from '../../components/StatusBadge';
import { formatDateTime } from '../../lib/formatDateTime';

/** Issued revisions, newest first: status, who prepared, checked and approved, and the content fingerprint. */
export function RevisionTable({ sheetId, revisions }: { sheetId: string; revisions: readonly RevisionSummary[] }) {
  if (revisions.length === 0) return <p className="text-ink-muted">No revision has been issued yet: a revision is issued when the checker approves the sheet.</p>;
  return (
    <table className="ruled">
      <thead>
        <tr>
          <th scope="col">Rev.</th>
          <th scope="col">Status</th>
          <th scope="col">Prepared</th>
          <th scope="col">Checked and approved</th>
          <th scope="col">Content sha-256</th>
        </tr>
      </thead>
      <tbody>
        {revisions.map((r) => (
          <tr key={r.number}>
            <td className="font-mono">
              <Link to={`/sheets/${sheetId}/revisions/${r.number}`}>{r.number}</Link>
            </td>
            <td>
              <StatusBadge status={r.status} />
              {r.supersededAt ? <span className="ml-1 font-mono text-[0.75rem] text-ink-faint">{formatDateTime(r.supersededAt)}</span> : null}
              {r.overrideReason ? (
                <p className="text-[0.75rem] text-ink-muted">
                  Approved over {r.openNotesAtApproval} open {r.openNotesAtApproval === 1 ? 'note' : 'notes'}: {r.overrideReason}
                </p>
              ) : null}
            </td>
            <td>
              {r.prepared.user.name} <span className="font-mono text-[0.75rem] text-ink-muted">{formatDateTime(r.prepared.at)}</span>
            </td>
            <td>
              {r.approved.user.name} <span className="font-mono text-[0.75rem] text-ink-muted">{formatDateTime(r.approved.at)}</span>
            </td>
            <td>
              <span className="font-mono text-[0.75rem]" title={r.contentSha256}>
                {r.contentSha256.slice(0, 12)}…
              </span>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
