import { useId } from 'react';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import { useCurrentOrganization } from '../hooks/useCurrentOrganization';
import { ROLE_INFO } from '../lib/roles';

/**
 * Chooses the organization the lists show. A detail page (one sheet, one project) belongs to the
 * organization it came from, so switching from there goes back to the matching list.
 */
export function OrganizationSwitcher() {
  const { membership, memberships, select } = useCurrentOrganization();
  const id = useId();
  const navigate = useNavigate();
  const { pathname } = useLocation();

  if (memberships.length === 0) {
    return (
      <Link to="/organizations/new" className="rounded-sm text-frame-text underline">
        Create an organization
      </Link>
    );
  }

  function onChange(organizationId: string) {
    select(organizationId);
    const detail = /^\/(sheets|projects)\/[^/]+/.exec(pathname);
    if (detail) navigate(`/${detail[1]}`);
  }

  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="sr-only">
        Organization
      </label>
      <select
        id={id}
        value={membership?.organization.id ?? ''}
        onChange={(e) => onChange(e.target.value)}
        className="max-w-[16rem] rounded-[3px] border border-frame-line bg-frame-raised px-2 py-1 text-frame-text"
      >
        {memberships.map((m) => (
          <option key={m.organization.id} value={m.organization.id}>
            {m.organization.name}
          </option>
        ))}
      </select>
      {membership ? (
        <span className="hidden text-[0.8125rem] text-frame-muted md:inline">
          as {ROLE_INFO[membership.role].label.toLowerCase()}
        </span>
      ) : null}
    </div>
  );
}
