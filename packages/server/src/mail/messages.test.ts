import { describe, expect, it } from 'vitest';
import { invitationMail, passwordResetMail } from './messages';

describe('mail messages', () => {
  it('writes the invitation in text and HTML, escaping names', () => {
    const mail = invitationMail({
      to: 'new@northgate.test',
      organizationName: 'Northgate <Lifting> & Co',
      inviterName: 'Olivia "O" Marsh',
      role: 'checker',
      link: 'http://localhost:3000/invite/abc',
      expiresAt: new Date('2026-12-08T12:00:00Z'),
    });
    expect(mail.subject).toBe('Join Northgate <Lifting> & Co on Sheaf');
    expect(mail.text).toContain('Olivia "O" Marsh has invited you to join Northgate <Lifting> & Co on Sheaf as a checker');
    expect(mail.text).toContain('http://localhost:3000/invite/abc');
    expect(mail.text).toContain('Tue, 08 Dec 2026 12:00:00 GMT');
    expect(mail.text).toContain('does not replace');
    expect(mail.html).toContain('Northgate &lt;Lifting&gt; &amp; Co');
    expect(mail.html).not.toContain('<Lifting>');
    expect(mail.html).toContain('href="http://localhost:3000/invite/abc"');
  });

  it('writes the reset mail with its lifetime', () => {
    const mail = passwordResetMail({ to: 'eamon@northgate.test', name: 'Eamon', link: 'http://x/reset/t', validMinutes: 60 });
    expect(mail.text).toContain('for 60 minutes');
    expect(mail.text).toContain('http://x/reset/t');
    expect(mail.html).toContain('Set a new password');
  });
});
