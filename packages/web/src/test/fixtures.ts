import type { MeResponse, Member, SheetSummary } from '../api/types';

/** Invented people and organizations for web tests. */
export const ORG_ID = '6f1c2a52-3d4e-4b7a-9c55-1f2e3d4c5b6a';
export const OTHER_ORG_ID = '0b7e1d2c-8a9f-4e3d-b2c1-a0f9e8d7c6b5';

export const alice = {
  id: '11111111-1111-4111-8111-111111111111',
  email: 'alice@hoist-works.test',
  name: 'Alice Marsh',
};
export const bruno = {
  id: '22222222-2222-4222-8222-222222222222',
  email: 'bruno@hoist-works.test',
  name: 'Bruno Keel',
};

export function meAs(role: 'owner' | 'engineer' | 'checker' | 'viewer'): MeResponse {
  return {
    user: alice,
    memberships: [
      { organization: { id: ORG_ID, name: 'Hoist Works', slug: 'hoist-works' }, role },
      {
        organization: { id: OTHER_ORG_ID, name: 'Pad & Pile', slug: 'pad-and-pile' },
        role: 'viewer',
      },
    ],
  };
}

export const members: Member[] = [
  { user: alice, role: 'owner', joinedAt: '2025-01-06T08:00:00.000Z' },
  { user: bruno, role: 'engineer', joinedAt: '2025-02-10T09:30:00.000Z' },
];

export const sheets: SheetSummary[] = [
  {
    id: 'aaaaaaaa-0000-4000-8000-000000000001',
    title: 'Lifting lug, weld toe',
    calcNumber: 'GBL-001',
    status: 'approved',
    projectId: 'bbbbbbbb-0000-4000-8000-000000000001',
    projectName: 'Gantry beam',
    updatedAt: '2025-03-14T09:05:00.000Z',
    revision: 2,
  },
  {
    id: 'aaaaaaaa-0000-4000-8000-000000000002',
    title: 'Hoist drive shaft, bending and torsion',
    calcNumber: 'HDS-004',
    status: 'in-check',
    projectId: 'bbbbbbbb-0000-4000-8000-000000000002',
    projectName: 'Hoist drive',
    updatedAt: '2025-03-15T16:40:00.000Z',
    revision: 1,
  },
];
