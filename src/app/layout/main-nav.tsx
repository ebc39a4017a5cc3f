import { NavLink } from 'react-router-dom';
import { classNames } from '../../components/ui/class-names';

// Members and the studio's settings are in the account menu, so the row fits a laptop screen.
export const mainNavItems = [
  { to: '/library', label: 'Library' },
  { to: '/originals', label: 'Originals' },
  { to: '/products', label: 'Products' },
  { to: '/calendar', label: 'Calendar' },
  { to: '/sales', label: 'What sells' },
  { to: '/templates', label: 'Templates' },
  { to: '/activity', label: 'Activity' },
] as const;

export function MainNav() {
  return (
    <nav aria-label="Main" className="-mx-1 overflow-x-auto">
      <ul className="flex items-center gap-1 px-1">
        {mainNavItems.map((item) => (
          <li key={item.to}>
            <NavLink
              to={item.to}
              className={({ isActive }) =>
                classNames(
                  'relative inline-flex min-h-10 items-center rounded-md px-3 font-semibold whitespace-nowrap',
                  isActive
                    ? 'text-tide-deep after:absolute after:inset-x-3 after:-bottom-0.5 after:h-0.5 after:rounded-full after:bg-tide'
                    : 'text-ink-soft hover:bg-sand/60 hover:text-ink',
                )
              }
            >
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
