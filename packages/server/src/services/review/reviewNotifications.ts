import type { AppDeps } from '../../deps';
import { checkRequestedMail, mentionMail, sheetApprovedMail, sheetReturnedMail, type MailSheet } from '../../mail/reviewMessages';
import type { ApprovalOutcome } from './approveSheet';
import type { CreatedNote } from './notes';
import type { TransitionOutcome } from './workflowTransitions';
import type { WorkflowRow } from './workflowRow';

/**
 * The e-mails of the check workflow, sent in the background after the change is committed: a
 * mail server that is slow or down never holds up or undoes a check. Failures are logged.
 */

function mailSheet(sheet: WorkflowRow, revision: number): MailSheet {
  return { calcNumber: sheet.calc_number, title: sheet.title, revision };
}

function sheetLink(deps: AppDeps, sheetId: string, suffix = ''): string {
  return `${deps.urls.publicUrl}/sheets/${sheetId}${suffix}`;
}

export function notifyCheckRequested(deps: AppDeps, outcome: TransitionOutcome, message?: string, reassigned = false): void {
  const checker = outcome.counterpart;
  if (checker === undefined) return;
  deps.mailer.sendInBackground(
    checkRequestedMail({
      to: checker.email,
      checkerName: checker.name,
      preparerName: reassigned ? (outcome.preparerName ?? 'the preparer') : outcome.actor.name,
      sheet: mailSheet(outcome.sheet, outcome.revision),
      link: sheetLink(deps, outcome.sheet.id),
      message: message ?? null,
      reassignedBy: reassigned ? outcome.actor.name : undefined,
    }),
  );
}

export function notifyReturned(deps: AppDeps, outcome: TransitionOutcome, message: string, openNotes: number): void {
  const preparer = outcome.counterpart;
  if (preparer === undefined) return;
  deps.mailer.sendInBackground(
    sheetReturnedMail({
      to: preparer.email,
      preparerName: preparer.name,
      checkerName: outcome.actor.name,
      sheet: mailSheet(outcome.sheet, outcome.revision),
      link: sheetLink(deps, outcome.sheet.id),
      message,
      openNotes,
    }),
  );
}

export function notifyApproved(deps: AppDeps, outcome: ApprovalOutcome, contentSha256: string, overrideReason: string | null): void {
  if (outcome.preparer === undefined) return;
  deps.mailer.sendInBackground(
    sheetApprovedMail({
      to: outcome.preparer.email,
      preparerName: outcome.preparer.name,
      approverName: outcome.approver.name,
      sheet: mailSheet(outcome.sheet, outcome.revision),
      link: sheetLink(deps, outcome.sheet.id, `/revisions/${outcome.revision}`),
      contentSha256,
      overrideReason,
    }),
  );
}

export function notifyMentions(deps: AppDeps, sheet: WorkflowRow, revision: number, created: CreatedNote, authorName: string, cellLabel: string): void {
  for (const member of created.mentioned) {
    deps.mailer.sendInBackground(
      mentionMail({
        to: member.email,
        name: member.name,
        authorName,
        sheet: mailSheet(sheet, revision),
        cellLabel,
        body: created.note.body,
        link: sheetLink(deps, sheet.id, `?note=${created.thread.id}`),
      }),
    );
  }
}
