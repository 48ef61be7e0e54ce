import { CAUTION, htmlMail } from './messages';
import type { OutgoingMail } from './mailer';

/** The sheet a workflow message is about, as its title block names it. */
export interface MailSheet {
  calcNumber: string;
  title: string;
  revision: number;
}

function sheetName(sheet: MailSheet): string {
  return `${sheet.calcNumber} "${sheet.title}", revision ${sheet.revision}`;
}

function mail(to: string, subject: string, lines: string[], link: { href: string; label: string }, quote?: { who: string; text: string }): OutgoingMail {
  const paragraphs = quote ? [...lines, `${quote.who} wrote:`, quote.text] : lines;
  const quoted = quote ? `\n\n${quote.who} wrote:\n${quote.text.split('\n').map((line) => `> ${line}`).join('\n')}` : '';
  return {
    to,
    subject,
    text: `${lines.join('\n\n')}${quoted}\n\n${link.label}:\n${link.href}\n\n--\n${CAUTION}\n`,
    html: htmlMail(subject, paragraphs, link, CAUTION),
  };
}

/** To the checker a sheet was submitted (or reassigned) to. */
export function checkRequestedMail(input: {
  to: string;
  checkerName: string;
  preparerName: string;
  sheet: MailSheet;
  link: string;
  message?: string | null;
  reassignedBy?: string;
}): OutgoingMail {
  const lines = [
    `Hello ${input.checkerName},`,
    input.reassignedBy
      ? `${input.reassignedBy} has made you the checker of ${sheetName(input.sheet)}, prepared by ${input.preparerName}.`
      : `${input.preparerName} has submitted ${sheetName(input.sheet)} for your check.`,
    'The sheet stays read-only while it is with you. Leave notes on the cells that need attention, then return it to the preparer or approve it. You cannot approve a sheet you prepared.',
  ];
  return mail(
    input.to,
    `Check requested: ${input.sheet.calcNumber} ${input.sheet.title}`,
    lines,
    { href: input.link, label: 'Open the sheet' },
    input.message ? { who: input.preparerName, text: input.message } : undefined,
  );
}

/** To the preparer when the checker returns the sheet. */
export function sheetReturnedMail(input: { to: string; preparerName: string; checkerName: string; sheet: MailSheet; link: string; message: string; openNotes: number }): OutgoingMail {
  const notes = input.openNotes === 0 ? 'No notes are open.' : `${input.openNotes} ${input.openNotes === 1 ? 'note is' : 'notes are'} open on the sheet.`;
  const lines = [
    `Hello ${input.preparerName},`,
    `${input.checkerName} has returned ${sheetName(input.sheet)} to you. It is a draft again and you can edit it. ${notes}`,
    'Answer the notes, make the changes, and submit the sheet for check again when it is ready.',
  ];
  return mail(input.to, `Returned: ${input.sheet.calcNumber} ${input.sheet.title}`, lines, { href: input.link, label: 'Open the sheet' }, {
    who: input.checkerName,
    text: input.message,
  });
}

/** To the preparer when the checker approves the sheet and its revision is issued. */
export function sheetApprovedMail(input: {
  to: string;
  preparerName: string;
  approverName: string;
  sheet: MailSheet;
  link: string;
  contentSha256: string;
  overrideReason: string | null;
}): OutgoingMail {
  const lines = [
    `Hello ${input.preparerName},`,
    `${input.approverName} has approved ${sheetName(input.sheet)}. The revision is issued and will not change; editing the sheet starts revision ${input.sheet.revision + 1} as a draft.`,
    `Content fingerprint (sha-256): ${input.contentSha256}`,
  ];
  if (input.overrideReason) lines.push(`It was approved over open notes, for this reason: ${input.overrideReason}`);
  return mail(input.to, `Approved: ${input.sheet.calcNumber} ${input.sheet.title} rev. ${input.sheet.revision}`, lines, {
    href: input.link,
    label: 'Open the issued revision',
  });
}

/** To a member named with @name in a note. */
export function mentionMail(input: { to: string; name: string; authorName: string; sheet: MailSheet; cellLabel: string; body: string; link: string }): OutgoingMail {
  const lines = [
    `Hello ${input.name},`,
    `${input.authorName} mentioned you in a note on ${input.cellLabel} of ${sheetName(input.sheet)}.`,
  ];
  return mail(input.to, `${input.authorName} mentioned you on ${input.sheet.calcNumber}`, lines, { href: input.link, label: 'Open the note' }, {
    who: input.authorName,
    text: input.body,
  });
}
