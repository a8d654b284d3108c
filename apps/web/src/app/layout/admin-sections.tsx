import { NavLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';

const SECTIONS = [
  { to: paths.adminUsers.href(), label: 'Users and roles' },
  { to: paths.adminTopics.href(), label: 'Topics' },
  { to: paths.adminClub.href(), label: 'Club locale' },
];

/** The admin area's own sub-navigation, shown at the top of each admin screen. */
export function AdminSections() {
  return (
    <nav aria-label="Admin sections">
      <ul className="flex flex-wrap gap-2">
        {SECTIONS.map((s) => (
          <li key={s.to}>
            <NavLink
              to={s.to}
              end
              className={({ isActive }) =>
                cn(
                  'inline-flex min-h-11 items-center rounded-md border border-sand-500 px-3 font-bold text-ink-900',
                  isActive && 'border-ink-800 bg-ink-800 text-sand-50',
                )
              }
            >
              {s.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
