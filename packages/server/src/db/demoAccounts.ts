import type { Role } from '@sheaf/engine/api';

/**
 * The demo organization's accounts, one per role, all with the documented demo password.
 * `npm start` prints these so a first-time user can sign in. Demo only: never reuse them.
 */
export const DEMO_PASSWORD = 'sheaf-demo-2026';

export const DEMO_ORGANIZATION = { name: 'Northgate Lifting Ltd.', slug: 'northgate-lifting' } as const;

export interface DemoAccount {
  role: Role;
  email: string;
  name: string;
  password: string;
}

export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  { role: 'owner', email: 'owner@demo.sheaf.test', name: 'Olivia Marsh', password: DEMO_PASSWORD },
  { role: 'engineer', email: 'engineer@demo.sheaf.test', name: 'Eamon Reyes', password: DEMO_PASSWORD },
  { role: 'checker', email: 'checker@demo.sheaf.test', name: 'Chandra Patel', password: DEMO_PASSWORD },
  { role: 'viewer', email: 'viewer@demo.sheaf.test', name: 'Victor Hale', password: DEMO_PASSWORD },
];
