/** An account the fake OAuth provider lets you pick, shaped like the provider's user API. */
export interface FakeOAuthAccount {
  id: number;
  login: string;
  name: string;
  emails: { email: string; primary: boolean; verified: boolean }[];
  /** One line on the consent page saying what picking this account shows. */
  note: string;
}

/**
 * The three accounts offered in development: a newcomer, one whose verified address is the demo
 * engineer's (so signing in links to that account), and one with no verified address (refused).
 */
export const DEFAULT_FAKE_ACCOUNTS: FakeOAuthAccount[] = [
  {
    id: 71001,
    login: 'ilse-draper',
    name: 'Ilse Draper',
    emails: [{ email: 'ilse.draper@fake-provider.test', primary: true, verified: true }],
    note: 'A new person: signing in creates a Sheaf account.',
  },
  {
    id: 71002,
    login: 'northgate-engineer',
    name: 'Demo Engineer',
    emails: [{ email: 'engineer@demo.sheaf.test', primary: true, verified: true }],
    note: 'Same verified e-mail as the demo engineer: signing in links to that account.',
  },
  {
    id: 71003,
    login: 'unverified-ulf',
    name: 'Ulf Brandt',
    emails: [{ email: 'ulf.brandt@fake-provider.test', primary: true, verified: false }],
    note: 'No verified e-mail: Sheaf refuses the sign-in.',
  },
];
