import { NavLink } from 'react-router-dom';

const LINKS = [
  { to: '/sheets', label: 'Sheets' },
  { to: '/projects', label: 'Projects' },
  { to: '/members', label: 'Members' },
  { to: '/profile', label: 'Profile' },
] as const;

/** The main navigation. The current page is marked by position bar and weight, and aria-current. */
export function SideNav() {
  return (
    <nav
      aria-label="Main"
      className="no-print w-36 shrink-0 border-r border-frame-line py-3 sm:w-44"
    >
      <ul className="space-y-0.5">
        {LINKS.map((link) => (
          <li key={link.to}>
            <NavLink
              to={link.to}
              className={({ isActive }) =>
                `block border-l-[3px] px-3 py-1.5 ${
                  isActive
                    ? 'border-accent bg-frame-raised font-semibold text-frame-text'
                    : 'border-transparent text-frame-muted hover:bg-frame-raised hover:text-frame-text'
                }`
              }
            >
              {link.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
