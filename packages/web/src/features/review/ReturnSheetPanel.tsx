import { useState } from 'react';
import type { ReviewState } from '@sheaf/engine/api';
import { useReturnSheet } from '../../api/review';
import { splitServerError } from '../../forms/serverErrors';
import { ActionPanel } from './ActionPanel';
import { TextAreaField } from './TextAreaField';

/** Return the sheet to its preparer with a message saying what to fix. */
export function ReturnSheetPanel({ review, onDone }: { review: ReviewState; onDone: () => void }) {
  const returning = useReturnSheet(review.sheetId);
  const [message, setMessage] = useState('');
  const [missing, setMissing] = useState(false);
  const errors = splitServerError(returning.error, { message: 'Message' });
  const notes = review.openNotes === 0 ? 'No notes are open.' : `${review.openNotes} ${review.openNotes === 1 ? 'note stays' : 'notes stay'} open for the preparer to answer.`;
  return (
    <ActionPanel
      title={`Return revision ${review.currentRevision} to ${review.preparer?.name ?? 'the preparer'}`}
      explanation={`The sheet becomes a draft again and the preparer is sent your message by e-mail. ${notes}`}
      error={errors.form}
      confirmLabel="Return to preparer"
      busy={returning.isPending}
      onCancel={onDone}
      onConfirm={() => {
        if (!message.trim()) {
          setMissing(true);
          return;
        }
        returning.mutate({ message: message.trim() }, { onSuccess: onDone });
      }}
    >
      <TextAreaField
        label="What should be fixed"
        name="message"
        value={message}
        maxLength={4000}
        onChange={(event) => {
          setMessage(event.target.value);
          setMissing(false);
        }}
        error={missing ? 'Message must say what the preparer should fix' : errors.field.message}
      />
    </ActionPanel>
  );
}
