import type { RevisionDetail } from '@sheaf/engine/api';
import { useMemo } from 'react';
import { CAUTION_TEXT } from '../../components/CautionFooter';
import { formatDateTime } from '../../lib/formatDateTime';
import { FrozenMaterialsList } from '../materials/FrozenMaterialsList';
import { CheckRecord } from './CheckRecord';
import { CheckSummary } from './CheckSummary';
import { DocumentCells } from './DocumentCells';
import { IssuedResultsAlert } from './IssuedResultsAlert';
import { issuedResults } from './issuedResults';

/**
 * An issued revision as a document, read top to bottom like the calculation that left the firm:
 * what it is (issued when, by whom, its content hash), the caution, every cell as the live sheet
 * draws it with the results it was issued with, the summary of its checks, the materials as
 * frozen with their sources, and the notes of the check with how each was resolved. The title
 * block is the page's (it repeats on every printed page).
 */
export function RevisionDocument({ sheetId, revision }: { sheetId: string; revision: RevisionDetail }) {
  const issued = useMemo(() => issuedResults(revision), [revision]);
  const system = revision.content.unitSystem === 'US' ? 'US' : 'SI';

  return (
    <article aria-label={`Revision ${revision.number} as issued`}>
      <div role="note" aria-label="Issue" className="mb-3 space-y-1 text-[0.875rem]">
        <p>
          Revision <span className="font-mono">{revision.number}</span>, issued{' '}
          <span className="font-mono">{formatDateTime(revision.approved.at)}</span> on approval by {revision.approved.user.name}
          {revision.supersededAt ? (
            <>
              ; <strong className="font-semibold">superseded</strong> on <span className="font-mono">{formatDateTime(revision.supersededAt)}</span> by
              revision <span className="font-mono">{revision.number + 1}</span>
            </>
          ) : null}
          . Units: {system === 'US' ? 'US customary' : 'SI'}.
        </p>
        <p>
          Content sha-256 <span className="font-mono break-all" data-content-hash="">{revision.contentSha256}</span>
        </p>
        <p className="border-l-2 border-ink pl-2 text-[0.8125rem]">
          <span className="font-medium">Caution: </span>
          {CAUTION_TEXT}
        </p>
      </div>
      <IssuedResultsAlert mismatches={issued.mismatches} />
      <DocumentCells revision={revision} issued={issued} />
      <CheckSummary cells={revision.content.cells} results={issued.results} system={system} />
      <FrozenMaterialsList materials={revision.materials} />
      <CheckRecord sheetId={sheetId} revision={revision} />
    </article>
  );
}
