import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Link } from 'react-router-dom';
import { useMe } from '../../api/auth';
import { describeError } from '../../api/ApiError';
import { useReviewState } from '../../api/review';
import { sheetKeys } from '../../api/sheets';
import type { Role, SheetSummary } from '../../api/types';
import { ApproveSheetPanel } from './ApproveSheetPanel';
import { ReassignCheckerPanel } from './ReassignCheckerPanel';
import { ReturnSheetPanel } from './ReturnSheetPanel';
import { ReviewStatusLine } from './ReviewStatusLine';
import { SubmitForCheckPanel } from './SubmitForCheckPanel';

type Action = 'submit' | 'return' | 'approve' | 'reassign';

/**
 * The check actions in the sheet header, for the people who may take them: submit for check
 * (with a checker picker), return with a message, approve (with a reason when notes are open),
 * and, for owners, reassign the checker. Which buttons show comes from the server's view of the
 * sheet (`review.can`), which applies the permission table and the per-sheet rules; the server
 * checks again when the action is taken.
 */
export function ReviewHeaderActions({ sheet }: { sheet: SheetSummary; role?: Role }) {
  const review = useReviewState(sheet.id);
  const me = useMe();
  const [open, setOpen] = useState<Action | null>(null);
  const queryClient = useQueryClient();
  const status = review.data?.status;
  // Someone else submitted, returned or approved the sheet: the page's copy of it is out of date.
  useEffect(() => {
    if (status !== undefined && status !== sheet.status) void queryClient.invalidateQueries({ queryKey: sheetKeys.detail(sheet.id) });
  }, [status, sheet.status, sheet.id, queryClient]);

  if (review.isError) {
    return <p role="alert" className="mb-4 text-fail">Could not load the check status: {describeError(review.error)}</p>;
  }
  if (!review.data) return <p className="mb-4 text-ink-muted">Loading the check status…</p>;
  const state = review.data;
  const userId = me.data?.user.id ?? '';
  const close = () => setOpen(null);
  const toggle = (action: Action) => setOpen((current) => (current === action ? null : action));

  return (
    <section aria-label="Check and approval" className="mb-5 border-b border-paper-rule pb-3">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <ReviewStatusLine review={state} />
        <div className="flex flex-wrap items-center gap-2">
          {state.can.submit ? (
            <button type="button" className="btn btn-primary" aria-expanded={open === 'submit'} onClick={() => toggle('submit')}>
              Submit for check…
            </button>
          ) : null}
          {state.can.return ? (
            <button type="button" className="btn" aria-expanded={open === 'return'} onClick={() => toggle('return')}>
              Return to preparer…
            </button>
          ) : null}
          {state.can.approve ? (
            <button type="button" className="btn btn-primary" aria-expanded={open === 'approve'} onClick={() => toggle('approve')}>
              Approve…
            </button>
          ) : null}
          {state.can.reassignChecker ? (
            <button type="button" className="btn" aria-expanded={open === 'reassign'} onClick={() => toggle('reassign')}>
              Reassign checker…
            </button>
          ) : null}
          {state.issuedRevision > 0 ? (
            <Link className="btn" to={`/sheets/${sheet.id}/revisions/${state.issuedRevision}`}>
              Issued revision {state.issuedRevision}
            </Link>
          ) : null}
          <Link className="btn" to={`/sheets/${sheet.id}/revisions`}>
            Revisions
          </Link>
          <Link className="btn" to={`/sheets/${sheet.id}/history`}>
            History
          </Link>
          <button type="button" className="btn" onClick={() => window.print()} title="Prints the live sheet, marked as not issued">
            Print draft…
          </button>
        </div>
      </div>
      {open === 'submit' && state.can.submit ? <SubmitForCheckPanel review={state} userId={userId} onDone={close} /> : null}
      {open === 'return' && state.can.return ? <ReturnSheetPanel review={state} onDone={close} /> : null}
      {open === 'approve' && state.can.approve ? <ApproveSheetPanel review={state} onDone={close} /> : null}
      {open === 'reassign' && state.can.reassignChecker ? <ReassignCheckerPanel review={state} onDone={close} /> : null}
    </section>
  );
}
