import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { meAs, sheets } from '../../test/fixtures';
import { mockFetch } from '../../test/mockFetch';
import { ReviewHeaderActions } from './ReviewHeaderActions';
import { alice, bruno, carla, renderWithClient, reviewState, SHEET_ID } from './reviewTestKit';

const sheet = { ...sheets[0]!, id: SHEET_ID };

describe('ReviewHeaderActions', () => {
  it('lets the preparer submit a draft to a checker other than themselves', async () => {
    let review = reviewState({ can: { ...reviewState().can, submit: true, createNotes: true } });
    const api = mockFetch({
      'GET /api/auth/me': { body: meAs('engineer') },
      'GET /api/auth/csrf': { body: { token: 't' } },
      [`GET /api/sheets/${SHEET_ID}/review`]: () => ({ body: { review } }),
      [`POST /api/sheets/${SHEET_ID}/submit`]: () => {
        review = reviewState({ status: 'in-check', checker: carla, preparer: alice, submittedAt: '2025-03-14T09:05:00.000Z' });
        return { body: { review } };
      },
    });
    renderWithClient(<ReviewHeaderActions sheet={sheet} />);
    expect(await screen.findByText('Revision 1 is in preparation and has not been submitted for check.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Approve…' })).toBeNull();

    fireEvent.click(screen.getByRole('button', { name: 'Submit for check…' }));
    const form = screen.getByRole('form', { name: 'Submit revision 1 for check' });
    const picker = within(form).getByLabelText('Checker') as HTMLSelectElement;
    // The signed-in preparer (Alice, an owner) is not offered as checker.
    await screen.findByRole('option', { name: 'Carla Quist (checker)' });
    expect([...picker.options].map((o) => o.textContent)).toEqual(['Choose a checker…', 'Carla Quist (checker)']);

    fireEvent.click(within(form).getByRole('button', { name: 'Submit for check' }));
    expect(await within(form).findByText('Checker must be chosen')).toBeTruthy();
    expect(api.to('POST', `/api/sheets/${SHEET_ID}/submit`)).toHaveLength(0);

    fireEvent.change(picker, { target: { value: carla.id } });
    fireEvent.change(within(form).getByLabelText('Message to the checker (optional)'), { target: { value: 'LC2 and LC3' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Submit for check' }));
    await screen.findByText(/is with Carla Quist for check since/);
    expect(api.to('POST', `/api/sheets/${SHEET_ID}/submit`)[0]?.body).toEqual({ checkerUserId: carla.id, message: 'LC2 and LC3' });
    expect(screen.queryByRole('form')).toBeNull();
  });

  it('asks the checker for a reason to approve over open notes, and shows what the server refused', async () => {
    const inCheck = reviewState({
      status: 'in-check',
      preparer: bruno,
      checker: alice,
      submittedAt: '2025-03-14T09:05:00.000Z',
      openNotes: 2,
      can: { ...reviewState().can, approve: true, return: true, createNotes: true, resolveNotes: true },
    });
    let attempts = 0;
    let review = inCheck;
    const api = mockFetch({
      'GET /api/auth/me': { body: meAs('checker') },
      'GET /api/auth/csrf': { body: { token: 't' } },
      [`GET /api/sheets/${SHEET_ID}/review`]: () => ({ body: { review } }),
      [`POST /api/sheets/${SHEET_ID}/approve`]: () => {
        if (++attempts === 1) {
          return { status: 409, body: { error: { code: 'conflict', message: '3 notes are still open: resolve them, or give overrideReason' } } };
        }
        review = { ...inCheck, status: 'approved', openNotes: 0, issuedRevision: 1, can: reviewState().can };
        return { status: 201, body: { revision: {}, review } };
      },
    });
    renderWithClient(<ReviewHeaderActions sheet={sheet} />);
    expect(await screen.findByText(/block approval unless overridden with a reason/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Approve…' }));
    const form = screen.getByRole('form', { name: 'Approve and issue revision 1' });
    expect(within(form).getByText('2 open notes')).toBeTruthy();

    fireEvent.click(within(form).getByRole('button', { name: 'Approve revision 1' }));
    expect(await within(form).findByText('Reason must be given while notes are open')).toBeTruthy();
    expect(api.to('POST', `/api/sheets/${SHEET_ID}/approve`)).toHaveLength(0);

    fireEvent.change(within(form).getByLabelText('Reason for approving over open notes'), { target: { value: 'Drawing notes only' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Approve revision 1' }));
    expect(await within(form).findByText('3 notes are still open: resolve them, or give overrideReason')).toBeTruthy();
    // The reason typed is kept for the next try.
    expect((within(form).getByLabelText('Reason for approving over open notes') as HTMLTextAreaElement).value).toBe('Drawing notes only');
    fireEvent.click(within(form).getByRole('button', { name: 'Approve revision 1' }));
    await screen.findByText(/Revision 1 is approved/);
    expect(api.to('POST', `/api/sheets/${SHEET_ID}/approve`).map((r) => r.body)).toEqual([
      { overrideReason: 'Drawing notes only' },
      { overrideReason: 'Drawing notes only' },
    ]);
  });

  it('shows the checker\'s return message, and no action to a viewer', async () => {
    mockFetch({
      'GET /api/auth/me': { body: meAs('viewer') },
      [`GET /api/sheets/${SHEET_ID}/review`]: {
        body: {
          review: reviewState({
            issuedRevision: 1,
            currentRevision: 2,
            openNotes: 1,
            lastReturn: { by: carla, at: '2025-03-15T16:40:00.000Z', message: 'Use the factored sling load.' },
          }),
        },
      },
    });
    renderWithClient(<ReviewHeaderActions sheet={sheet} />);
    expect(await screen.findByText('Revision 2 is in preparation; revision 1 is issued.')).toBeTruthy();
    expect(screen.getByText('Use the factored sling load.')).toBeTruthy();
    expect(screen.getByText('1 open note')).toBeTruthy();
    // No workflow action; printing the draft is open to anyone who reads the sheet.
    const buttons = screen.queryAllByRole('button').map((b) => b.textContent);
    expect(buttons).toEqual(['Print draft…']);
    expect(screen.getByRole('link', { name: 'Revisions' }).getAttribute('href')).toBe(`/sheets/${SHEET_ID}/revisions`);
    expect(screen.getByRole('link', { name: 'Issued revision 1' }).getAttribute('href')).toBe(`/sheets/${SHEET_ID}/revisions/1`);
  });

  it('lets an owner hand the check to another member, never the preparer', async () => {
    const inCheck = reviewState({ status: 'in-check', preparer: bruno, checker: carla, submittedAt: '2025-03-14T09:05:00.000Z', can: { ...reviewState().can, reassignChecker: true } });
    let review = inCheck;
    const api = mockFetch({
      'GET /api/auth/me': { body: meAs('owner') },
      'GET /api/auth/csrf': { body: { token: 't' } },
      [`GET /api/sheets/${SHEET_ID}/review`]: () => ({ body: { review } }),
      [`POST /api/sheets/${SHEET_ID}/checker`]: () => {
        review = { ...inCheck, checker: alice };
        return { body: { review } };
      },
    });
    renderWithClient(<ReviewHeaderActions sheet={sheet} />);
    fireEvent.click(await screen.findByRole('button', { name: 'Reassign checker…' }));
    const form = screen.getByRole('form', { name: 'Reassign the checker' });
    const picker = within(form).getByLabelText('Checker') as HTMLSelectElement;
    expect([...picker.options].map((o) => o.textContent)).toEqual(['Choose a checker…', 'Alice Marsh (owner)']);
    fireEvent.change(picker, { target: { value: alice.id } });
    fireEvent.click(within(form).getByRole('button', { name: 'Reassign' }));
    await screen.findByText(/is with Alice Marsh for check/);
    expect(api.to('POST', `/api/sheets/${SHEET_ID}/checker`)[0]?.body).toEqual({ checkerUserId: alice.id });
  });
});
