import { Router } from 'express';
import { escapeHtml, renderPage } from '../http/html';
import type { SmtpInbox } from './smtpInbox';

/** Text with its web addresses turned into links (everything else escaped). */
function linkify(text: string): string {
  const parts = text.split(/(https?:\/\/[^\s<>"]+)/g);
  return parts.map((part, i) => (i % 2 === 1 ? `<a href="${escapeHtml(part)}">${escapeHtml(part)}</a>` : escapeHtml(part))).join('');
}

/** `/dev/mail`: a page listing what the fake SMTP caught, newest first, refreshing itself. */
export function devInboxPage(inbox: SmtpInbox): Router {
  const router = Router();
  router.get('/dev/mail', (_req, res) => {
    const messages = inbox.list();
    const items = messages
      .map(
        (m) => `
        <article style="border-top:1px solid #d6d0c2;padding:.75rem 0">
          <div><strong>${escapeHtml(m.subject)}</strong></div>
          <div style="font-size:13px;color:#55595f">to ${escapeHtml(m.to)} &middot; from ${escapeHtml(m.from)} &middot;
            <time datetime="${escapeHtml(m.receivedAt)}">${escapeHtml(m.receivedAt.replace('T', ' ').slice(0, 19))} UTC</time></div>
          <pre>${linkify(m.text)}</pre>
        </article>`,
      )
      .join('');
    res
      .type('html')
      .send(
        renderPage(
          'Sheaf dev inbox',
          `<h1>Dev inbox</h1>
           <p class="lead">Mail the server sent through its local fake SMTP server (development and test only).
           ${messages.length} message${messages.length === 1 ? '' : 's'}; this page refreshes every 5 seconds.
           As JSON: <a href="/api/dev/mail">/api/dev/mail</a>.</p>
           ${items || '<p>No mail yet.</p>'}`,
          '<meta http-equiv="refresh" content="5">',
        ),
      );
  });
  return router;
}
