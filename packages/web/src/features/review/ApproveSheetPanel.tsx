import { useState } from 'react';
import type { ReviewState } from '@sheaf/engine/api';
import { useApproveSheet } from '../../api/review';
import { splitServerError } from '../../forms/serverErrors';
import { ActionPanel } from './ActionPanel';
import { NoteStateLabel } from './NoteStateLabel';
import { TextAreaField } from './TextAreaField';

/**
 * Approve and issue the revision. With notes still open, the checker must say why they approve
 * over them; the reason is recorded with the revision.
 */
export function ApproveSheetPanel({ review, onDone }: { review: ReviewState; onDone: () => void }) {
  const approve = useApproveSheet(review.sheetId);
  const [reason, setReason] = useState('');
  const [missing, setMissing] = useState(false);
  const errors = splitServerError(approve.error, { overrideReason: 'Reason' });
  const open = review.openNotes;
  return (
    <ActionPanel
      title={`Approve and issue revision ${review.currentRevision}`}
      explanation={
        <>
          The revision is issued as it stands: its content, the results the server computes from it and a fingerprint of
          the content are recorded with your name and never change. {review.preparer?.name ?? 'The preparer'} is sent an
          e-mail. Results support, not replace, engineering judgement; approval rests with licensed practice.
        </>
      }
      error={errors.form}
      confirmLabel={`Approve revision ${review.currentRevision}`}
      busy={approve.isPending}
      onCancel={onDone}
      onConfirm={() => {
        if (open > 0 && !reason.trim()) {
          setMissing(true);
          return;
        }
        approve.mutate(open > 0 ? { overrideReason: reason.trim() } : {}, { onSuccess: onDone });
      }}
    >
      {open > 0 ? (
        <>
          <p className="flex items-center gap-2">
            <NoteStateLabel state="open" count={open} />
            <span>
              Resolve {open === 1 ? 'it' : 'them'}, or approve over {open === 1 ? 'it' : 'them'} with a reason.
            </span>
          </p>
          <TextAreaField
            label="Reason for approving over open notes"
            name="overrideReason"
            value={reason}
            maxLength={2000}
            hint="Recorded with the revision and shown in its history."
            onChange={(event) => {
              setReason(event.target.value);
              setMissing(false);
            }}
            error={missing ? 'Reason must be given while notes are open' : errors.field.overrideReason}
          />
        </>
      ) : null}
    </ActionPanel>
  );
}
