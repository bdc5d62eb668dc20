import { useState, type ReactNode } from 'react';
import { NavLink, useLocation, useNavigation } from 'react-router-dom';
import type { Role } from '@shared/schemas/users';
import { paths } from '@/config/paths';
import { NotificationsIndicator } from '@/features/notifications/components/notifications-indicator';
import { useUser } from '@/lib/auth';
import { Button } from '../ui/button';
import { cx } from '../ui/cx';
import { SignOutButton } from './sign-out-button';

interface NavItem {
  to: string;
  label: string;
  /** Other paths that belong to this item (a grower's page under contracts). */
  alsoActive?: string[];
}

/** What each role can reach. Screens later work adds are listed here only once they work. */
export function navigationFor(role: Role): NavItem[] {
  switch (role) {
    case 'owner':
    case 'planner':
      return [
        { to: paths.atlas, label: 'Atlas' },
        { to: paths.yards, label: 'Yards' },
        { to: paths.sites, label: 'Sites' },
        { to: paths.contracts, label: 'Growers & contracts', alsoActive: [paths.growers] },
        { to: paths.moves, label: 'Moves' },
        { to: paths.season, label: 'Season' },
        { to: paths.tonight, label: 'Tonight' },
        { to: paths.sprayNotices, label: 'Spray notices' },
        { to: paths.invoices, label: 'Invoices' },
        ...(role === 'owner' ? [{ to: paths.receivables, label: 'Receivables' }] : []),
        { to: paths.settings, label: 'Settings' },
      ];
    case 'crew':
      return [
        { to: paths.tonight, label: 'Tonight' },
        { to: paths.moves, label: 'Moves' },
        { to: paths.season, label: 'Season' },
        { to: paths.atlas, label: 'Atlas' },
        { to: paths.yards, label: 'Yards' },
        { to: paths.contracts, label: 'Contracts' },
        { to: paths.sprayNotices, label: 'Spray notices' },
        { to: paths.settings, label: 'Settings' },
      ];
    case 'grower':
      return [{ to: paths.portal, label: 'Your orchards', alsoActive: [paths.yourContracts] }];
  }
}

const roleName: Record<Role, string> = {
  owner: 'Owner',
  planner: 'Planner',
  crew: 'Crew',
  grower: 'Grower',
};

/** The signed-in shell: brand, navigation by role, who is signed in, sign-out. */
export function AppLayout({ children }: { children: ReactNode }) {
  const user = useUser();
  const location = useLocation();
  const navigation = useNavigation();
  const [menuOpen, setMenuOpen] = useState(false);
  const [menuPath, setMenuPath] = useState(location.pathname);
  // Close the phone menu whenever the page changes.
  if (menuPath !== location.pathname) {
    setMenuPath(location.pathname);
    setMenuOpen(false);
  }
  const items = navigationFor(user.role);

  const links = (
    <ul className="flex flex-col gap-1 md:flex-row md:flex-wrap md:items-center">
      {items.map((item) => (
        <li key={item.to}>
          <NavLink
            to={item.to}
            className={({ isActive }) => {
              const active =
                isActive || item.alsoActive?.some((p) => location.pathname.startsWith(p));
              return cx(
                'block rounded-md px-3 py-2 font-medium no-underline hover:bg-dusk-700 hover:no-underline',
                active ? 'bg-dusk-700 text-ember-300' : 'text-dusk-100',
              );
            }}
          >
            {item.label}
          </NavLink>
        </li>
      ))}
    </ul>
  );

  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded focus:bg-dusk-800 focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <header className="border-b border-dusk-700 bg-dusk-950 print:hidden">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3 px-4 py-3">
          <span className="flex flex-col leading-tight">
            <span className="text-lg font-semibold text-ember-300">Duskhaul</span>
            <span className="text-xs text-dusk-300">{user.operationName}</span>
          </span>
          {/* Its own row under the brand and the user, so every screen fits at any width. */}
          <nav aria-label="Main" className="order-last hidden w-full md:block">
            {links}
          </nav>
          <div className="hidden items-center gap-3 md:flex">
            <NotificationsIndicator enabled={user.role !== 'grower'} />
            <span className="text-right text-sm leading-tight">
              <span className="block text-dusk-100">{user.name}</span>
              <span className="block text-dusk-300">{roleName[user.role]}</span>
            </span>
            <SignOutButton />
          </div>
          <Button
            variant="secondary"
            size="sm"
            className="md:hidden"
            aria-expanded={menuOpen}
            aria-controls="phone-menu"
            onClick={() => setMenuOpen((open) => !open)}
          >
            {menuOpen ? 'Close menu' : 'Menu'}
          </Button>
        </div>
        {menuOpen && (
          <div id="phone-menu" className="border-t border-dusk-700 px-4 pb-4 md:hidden">
            <nav aria-label="Main" className="pt-3">
              {links}
            </nav>
            <NotificationsIndicator enabled={user.role !== 'grower'} />
            <div className="mt-3 flex items-center justify-between gap-3 border-t border-dusk-700 pt-3">
              <span className="text-sm">
                {user.name} · <span className="text-dusk-300">{roleName[user.role]}</span>
              </span>
              <SignOutButton />
            </div>
          </div>
        )}
        <div
          aria-hidden="true"
          className={cx(
            'h-0.5 bg-ember-400 transition-opacity',
            navigation.state === 'loading' ? 'animate-pulse opacity-100' : 'opacity-0',
          )}
        />
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6">
        {children}
      </main>
    </div>
  );
}
