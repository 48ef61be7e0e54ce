import { NavLink } from 'react-router-dom';

const LINKS = [
  { to: '/sheets', label: 'Sheets' },
  { to: '/projects', label: 'Projects' },
  { to: '/templates', label: 'Templates' },
  { to: '/materials', label: 'Materials' },
  { to: '/members', label: 'Members' },
  { to: '/profile', label: 'Profile' },
] as const;

/**
 * The main navigation: a column on wide screens, a row under the top bar on narrow ones. The current
 * page is marked by an accent bar and weight (not colour alone), and by aria-current.
 */
export function SideNav() {
  return (
    <nav
      aria-label="Main"
      className="no-print shrink-0 border-b border-frame-line md:w-44 md:border-r md:border-b-0 md:py-3"
    >
      <ul className="flex overflow-x-auto md:block md:space-y-0.5">
        {LINKS.map((link) => (
          <li key={link.to}>
            <NavLink
              to={link.to}
              className={({ isActive }) =>
                `block border-b-[3px] px-3 py-2 whitespace-nowrap md:border-b-0 md:border-l-[3px] md:py-1.5 ${
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
