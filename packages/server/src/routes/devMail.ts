import { DevMailResponse } from '@sheaf/engine/api';
import type { SmtpInbox } from '../fakes/smtpInbox';
import { defineRoute, ok, type Route } from './defineRoute';

/** The fake SMTP's inbox as JSON (development and test only, and only when the fake is running). */
export function devMailRoutes(inbox: SmtpInbox | null): Route[] {
  if (!inbox) return [];
  return [
    defineRoute({
      id: 'dev.mail',
      method: 'get',
      path: '/api/dev/mail',
      summary: 'Mail caught by the local fake SMTP server, newest first (development and test only)',
      tag: 'development',
      access: { kind: 'public' },
      response: { status: 200, description: 'The caught messages', schema: DevMailResponse },
      handler: async () => ok({ messages: inbox.list() }),
    }),
  ];
}
