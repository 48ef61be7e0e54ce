import { useState } from 'react';
import type { ReviewState } from '@sheaf/engine/api';
import { useSubmitForCheck } from '../../api/review';
import { splitServerError } from '../../forms/serverErrors';
import { ActionPanel } from './ActionPanel';
import { CheckerPicker } from './CheckerPicker';
import { TextAreaField } from './TextAreaField';

/** Submit the draft for check: pick the checker, add a word for them, confirm. */
export function SubmitForCheckPanel({ review, userId, onDone }: { review: ReviewState; userId: string; onDone: () => void }) {
  const submit = useSubmitForCheck(review.sheetId);
  // The last checker is the natural default when the sheet comes back for a second look.
  const previous = review.checker && review.checker.id !== userId ? review.checker.id : '';
  const [checkerUserId, setChecker] = useState(previous);
  const [message, setMessage] = useState('');
  const [missing, setMissing] = useState(false);
  const errors = splitServerError(submit.error, { checkerUserId: 'Checker', message: 'Message' });
  return (
    <ActionPanel
      title={`Submit revision ${review.currentRevision} for check`}
      explanation="The checker is sent an e-mail. From now until they return or approve it, the sheet is read-only for everyone."
      error={errors.form}
      confirmLabel="Submit for check"
      busy={submit.isPending}
      onCancel={onDone}
      onConfirm={() => {
        if (!checkerUserId) {
          setMissing(true);
          return;
        }
        submit.mutate({ checkerUserId, ...(message.trim() ? { message: message.trim() } : {}) }, { onSuccess: onDone });
      }}
    >
      <CheckerPicker
        candidates={review.checkerCandidates}
        excluded={[userId]}
        value={checkerUserId}
        onChange={(id) => {
          setChecker(id);
          setMissing(false);
        }}
        error={missing ? 'Checker must be chosen' : errors.field.checkerUserId}
      />
      <TextAreaField
        label="Message to the checker (optional)"
        name="message"
        value={message}
        maxLength={4000}
        onChange={(event) => setMessage(event.target.value)}
        error={errors.field.message}
      />
    </ActionPanel>
  );
}
