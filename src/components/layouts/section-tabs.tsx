import { NavLink } from 'react-router-dom';
import { cx } from '../ui/cx';

/** Tabs between sibling screens of one section (contracts and growers; parts of settings). */
export function SectionTabs({
  label,
  items,
}: {
  label: string;
  items: Array<{ to: string; label: string }>;
}) {
  return (
    <nav aria-label={label} className="mb-6 overflow-x-auto border-b border-dusk-700">
      <ul className="flex gap-1">
        {items.map((item) => (
          <li key={item.to}>
            <NavLink
              to={item.to}
              className={({ isActive }) =>
                cx(
                  'block border-b-2 px-3 py-2 font-medium whitespace-nowrap no-underline hover:no-underline',
                  isActive
                    ? 'border-ember-400 text-ember-300'
                    : 'border-transparent text-dusk-200 hover:text-dusk-50',
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
