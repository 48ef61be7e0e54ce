import type { User } from '../api/types';
import { OrganizationSwitcher } from './OrganizationSwitcher';
import { UserMenu } from './UserMenu';
import { Wordmark } from './Wordmark';

export function TopBar({ user }: { user: User }) {
  return (
    <header className="no-print flex h-12 items-center gap-4 border-b border-frame-line bg-frame px-3 text-frame-text sm:px-4">
      <Wordmark to="/sheets" />
      <span aria-hidden="true" className="h-5 w-px bg-frame-line" />
      <OrganizationSwitcher />
      <div className="ml-auto">
        <UserMenu user={user} />
      </div>
    </header>
  );
}
