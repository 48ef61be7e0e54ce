import { useState } from 'react';
import type { ReviewState } from '@sheaf/engine/api';
import { useReassignChecker } from '../../api/review';
import { splitServerError } from '../../forms/serverErrors';
import { ActionPanel } from './ActionPanel';
import { CheckerPicker } from './CheckerPicker';

/** Owners: hand the check to another member (never the sheet's preparer). */
export function ReassignCheckerPanel({ review, onDone }: { review: ReviewState; onDone: () => void }) {
  const reassign = useReassignChecker(review.sheetId);
  const [checkerUserId, setChecker] = useState('');
  const [missing, setMissing] = useState(false);
  const errors = splitServerError(reassign.error, { checkerUserId: 'Checker' });
  const excluded = [review.preparer?.id, review.checker?.id].filter((id): id is string => typeof id === 'string');
  return (
    <ActionPanel
      title="Reassign the checker"
      explanation={`The check moves from ${review.checker?.name ?? 'the current checker'} to the member you choose, who is sent an e-mail. The sheet stays in check.`}
      error={errors.form}
      confirmLabel="Reassign"
      busy={reassign.isPending}
      onCancel={onDone}
      onConfirm={() => {
        if (!checkerUserId) {
          setMissing(true);
          return;
        }
        reassign.mutate({ checkerUserId }, { onSuccess: onDone });
      }}
    >
      <CheckerPicker
        candidates={review.checkerCandidates}
        excluded={excluded}
        value={checkerUserId}
        onChange={(id) => {
          setChecker(id);
          setMissing(false);
        }}
        error={missing ? 'Checker must be chosen' : errors.field.checkerUserId}
      />
    </ActionPanel>
  );
}
