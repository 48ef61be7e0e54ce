import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { Membership } from '../api/types';
import { useCurrentOrganization } from '../hooks/useCurrentOrganization';
import { Paper } from './Paper';

/**
 * Renders `children` with the current organization, or explains what to do when the user
 * belongs to none yet.
 */
export function RequireOrganization({
  children,
}: {
  children: (membership: Membership) => ReactNode;
}) {
  const { membership } = useCurrentOrganization();
  if (!membership) {
    return (
      <Paper>
        <h1 className="text-[1.25rem]">No organization yet</h1>
        <p className="mt-2 max-w-prose text-ink-muted">
          Sheets and projects belong to an organization. Create one for your team, or open the
          invitation link a colleague sent you to join theirs.
        </p>
        <p className="mt-4">
          <Link to="/organizations/new" className="btn btn-primary">
            Create an organization
          </Link>
        </p>
      </Paper>
    );
  }
  return <>{children(membership)}</>;
}
