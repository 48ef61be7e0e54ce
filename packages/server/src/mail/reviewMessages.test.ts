import { describe, expect, it } from 'vitest';
import { checkRequestedMail, mentionMail, sheetApprovedMail, sheetReturnedMail } from './reviewMessages';

const sheet = { calcNumber: 'GBL-003', title: 'Lifting lug <A-A>', revision: 2 };

describe('check workflow messages', () => {
  it('asks the checker to check, quoting the preparer, in text and escaped HTML', () => {
    const mail = checkRequestedMail({ to: 'c@x.test', checkerName: 'Chandra', preparerName: 'Eamon', sheet, link: 'http://h/sheets/1', message: 'Weld throat now 6 mm' });
    expect(mail.subject).toBe('Check requested: GBL-003 Lifting lug <A-A>');
    expect(mail.text).toContain('Eamon has submitted GBL-003 "Lifting lug <A-A>", revision 2 for your check.');
    expect(mail.text).toContain('> Weld throat now 6 mm');
    expect(mail.text).toContain('http://h/sheets/1');
    expect(mail.html).toContain('Lifting lug &lt;A-A&gt;');
    expect(mail.html).not.toContain('<A-A>');
    expect(mail.text).toContain('does not replace');
    const reassigned = checkRequestedMail({ to: 'o@x.test', checkerName: 'Olivia', preparerName: 'Eamon', sheet, link: 'l', reassignedBy: 'Olivia' });
    expect(reassigned.text).toContain('Olivia has made you the checker of GBL-003');
  });

  it('tells the preparer the sheet came back, with the message and the open notes', () => {
    const mail = sheetReturnedMail({ to: 'e@x.test', preparerName: 'Eamon', checkerName: 'Chandra', sheet, link: 'l', message: 'See note on S', openNotes: 2 });
    expect(mail.subject).toBe('Returned: GBL-003 Lifting lug <A-A>');
    expect(mail.text).toContain('2 notes are open on the sheet.');
    expect(mail.text).toContain('Chandra wrote:\n> See note on S');
  });

  it('announces the issued revision with its fingerprint and any override', () => {
    const mail = sheetApprovedMail({ to: 'e@x.test', preparerName: 'Eamon', approverName: 'Chandra', sheet, link: 'l', contentSha256: 'ab'.repeat(32), overrideReason: 'drawing note only' });
    expect(mail.subject).toBe('Approved: GBL-003 Lifting lug <A-A> rev. 2');
    expect(mail.text).toContain('editing the sheet starts revision 3 as a draft');
    expect(mail.text).toContain(`sha-256): ${'ab'.repeat(32)}`);
    expect(mail.text).toContain('for this reason: drawing note only');
  });

  it('tells a mentioned member where', () => {
    const mail = mentionMail({ to: 'o@x.test', name: 'Olivia', authorName: 'Chandra', sheet, cellLabel: 'cell DE', body: '@Olivia is Sy right?', link: 'l' });
    expect(mail.subject).toBe('Chandra mentioned you on GBL-003');
    expect(mail.text).toContain('mentioned you in a note on cell DE of GBL-003');
    expect(mail.html).toContain('@Olivia is Sy right?');
  });
});
