import type { ReviewState } from '@sheaf/engine/api';
import { formatDateTime } from '../../lib/formatDateTime';
import { NoteStateLabel } from './NoteStateLabel';

/** Where the sheet stands in the check workflow, in one or two sentences. */
export function ReviewStatusLine({ review }: { review: ReviewState }) {
  const n = review.currentRevision;
  return (
    <div className="min-w-0 text-[0.875rem]">
      <p>{sentence(review)}</p>
      {review.lastReturn ? (
        <p className="mt-1 text-ink-muted">
          Returned by {review.lastReturn.by.name} on <span className="font-mono">{formatDateTime(review.lastReturn.at)}</span>:{' '}
          <q className="text-ink">{review.lastReturn.message}</q>
        </p>
      ) : null}
      {review.openNotes > 0 && review.status !== 'approved' ? (
        <p className="mt-1">
          <NoteStateLabel state="open" count={review.openNotes} />
          <span className="text-ink-muted"> on revision {n}{review.status === 'in-check' ? ' block approval unless overridden with a reason' : ''}.</span>
        </p>
      ) : null}
    </div>
  );
}

function sentence(review: ReviewState): string {
  const n = review.currentRevision;
  switch (review.status) {
    case 'draft':
      return review.issuedRevision > 0
        ? `Revision ${n} is in preparation; revision ${review.issuedRevision} is issued.`
        : `Revision ${n} is in preparation and has not been submitted for check.`;
    case 'in-check':
      return `Revision ${n} is with ${review.checker?.name ?? 'the checker'} for check since ${review.submittedAt ? formatDateTime(review.submittedAt) : '—'}, prepared by ${review.preparer?.name ?? '—'}. The sheet is read-only until it is returned or approved.`;
    case 'approved':
      return `Revision ${n} is approved${review.signatures.approved ? ` by ${review.signatures.approved.user.name} on ${formatDateTime(review.signatures.approved.at)}` : ''}. Editing the sheet starts revision ${n + 1}.`;
    case 'superseded':
      return `Revision ${n} is superseded.`;
  }
}
