import type { Role } from '@sheaf/engine/api';
import { escapeHtml } from '../http/html';
import type { OutgoingMail } from './mailer';

const ROLE_WORDS: Record<Role, string> = {
  owner: 'an owner (manages members and settings, and can do everything else)',
  engineer: 'an engineer (prepares and edits calculation sheets and submits them for check)',
  checker: 'a checker (reviews sheets, writes notes, returns or approves them)',
  viewer: 'a viewer (reads sheets and their revisions)',
};

/** The engineering caution every message ends with. */
export const CAUTION =
  'Sheaf supports the judgement of a qualified engineer; it does not replace it. Verify results against the ' +
  'governing codes; approval of a calculation rests with licensed practice.';

/** A message's HTML part: heading, paragraphs, one button-like link and a footer. */
export function htmlMail(heading: string, paragraphs: string[], link: { href: string; label: string }, footer: string): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 12px">${escapeHtml(p)}</p>`).join('');
  return `<!doctype html><html><body style="margin:0;background:#ece8de;font:15px/1.5 sans-serif;color:#1d1f22">
<div style="max-width:560px;margin:24px auto;background:#fbf8f1;padding:24px;border:1px solid #d6d0c2">
<h1 style="font-size:18px;margin:0 0 12px">${escapeHtml(heading)}</h1>
${body}
<p style="margin:18px 0"><a href="${escapeHtml(link.href)}" style="background:#1f5fa8;color:#fff;padding:8px 14px;text-decoration:none;border-radius:4px">${escapeHtml(link.label)}</a></p>
<p style="margin:0 0 12px;font-size:13px;color:#55595f">If the button does not work, paste this address into your browser:<br>${escapeHtml(link.href)}</p>
<p style="margin:18px 0 0;font-size:12px;color:#6b6f75">${escapeHtml(footer)}</p>
</div></body></html>`;
}

/** The invitation e-mail: who invites whom, to which organization, with which role. */
export function invitationMail(input: {
  to: string;
  organizationName: string;
  inviterName: string;
  role: Role;
  link: string;
  expiresAt: Date;
}): OutgoingMail {
  const expires = input.expiresAt.toUTCString();
  const lines = [
    `${input.inviterName} has invited you to join ${input.organizationName} on Sheaf as ${ROLE_WORDS[input.role]}.`,
    `Open the link to accept. If you have no Sheaf account yet, sign up with this e-mail address (${input.to}) first. The link works once and expires on ${expires}.`,
  ];
  const footer = `If you did not expect this invitation, ignore this message; nothing happens unless the link is used. ${CAUTION}`;
  return {
    to: input.to,
    subject: `Join ${input.organizationName} on Sheaf`,
    text: `${lines.join('\n\n')}\n\nAccept the invitation:\n${input.link}\n\n--\n${footer}\n`,
    html: htmlMail(`Join ${input.organizationName} on Sheaf`, lines, { href: input.link, label: 'Accept the invitation' }, footer),
  };
}

/** The password reset e-mail with its one-time link. */
export function passwordResetMail(input: { to: string; name: string; link: string; validMinutes: number }): OutgoingMail {
  const lines = [
    `Hello ${input.name},`,
    `someone (we hope you) asked to set a new password for the Sheaf account of ${input.to}.`,
    `The link below works once, for ${input.validMinutes} minutes. Setting a new password signs you out everywhere else.`,
  ];
  const footer = 'If you did not ask for this, ignore this message: your password stays as it is.';
  return {
    to: input.to,
    subject: 'Set a new Sheaf password',
    text: `${lines.join('\n\n')}\n\nSet a new password:\n${input.link}\n\n--\n${footer}\n`,
    html: htmlMail('Set a new Sheaf password', lines, { href: input.link, label: 'Set a new password' }, footer),
  };
}
