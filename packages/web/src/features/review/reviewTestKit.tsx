import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router-dom';
import type { ReviewState } from '@sheaf/engine/api';
import { createAppQueryClient } from '../../api/queryClient';
import { alice, bruno } from '../../test/fixtures';

/** Renders review components with a fresh query client and a router, over whatever fetch is mocked. */
export function renderWithClient(ui: ReactNode) {
  const queryClient = createAppQueryClient();
  return render(
    <QueryClientProvider client={queryClient}>
      <MemoryRouter>{ui}</MemoryRouter>
    </QueryClientProvider>,
  );
}

export const SHEET_ID = 'aaaaaaaa-0000-4000-8000-000000000001';

export const carla = { id: '33333333-3333-4333-8333-333333333333', name: 'Carla Quist' };

/** A workflow state of the lug sheet; override what a test is about. */
export function reviewState(overrides: Partial<ReviewState> = {}): ReviewState {
  return {
    sheetId: SHEET_ID,
    status: 'draft',
    issuedRevision: 0,
    currentRevision: 1,
    preparer: null,
    checker: null,
    submittedAt: null,
    openNotes: 0,
    signatures: { prepared: null, checked: null, approved: null },
    lastReturn: null,
    checkerCandidates: [
      { id: alice.id, name: alice.name, role: 'owner' },
      { id: carla.id, name: carla.name, role: 'checker' },
    ],
    can: { submit: false, return: false, approve: false, reassignChecker: false, createNotes: false, resolveNotes: false },
    ...overrides,
  };
}

export { alice, bruno };
