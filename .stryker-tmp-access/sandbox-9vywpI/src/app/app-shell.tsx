// @ts-nocheck
import { useRef, useState } from 'react';
import { NavLink, Outlet, useLocation } from 'react-router-dom';
import { HealthIndicator } from '@/features/health/components/health-indicator';
import { AccountMenu, useAdminNavItems } from '@/features/auth/components/account-menu';
import { UnitSystemSync } from '@/features/auth/components/unit-system-sync';
import { useScrollableTablesFocusable } from './scrollable-tables';

const nav = [
  { to: '/', label: 'Projects', end: true },
  { to: '/calculator', label: 'Air-state calculator' },
];

export function AppShell() {
  const items = [...nav, ...useAdminNavItems()];
  // Below 768 px the navigation and the account fold behind one button, so the header never runs off a phone.
  const [menuOpen, setMenuOpen] = useState(false);
  const menuButton = useRef<HTMLButtonElement>(null);
  const { pathname } = useLocation();
  // A new page closes the menu: adjusted while rendering, as React advises for state that follows a prop.
  const [menuPath, setMenuPath] = useState(pathname);
  if (menuPath !== pathname) {
    setMenuPath(pathname);
    setMenuOpen(false);
  }
  useScrollableTablesFocusable();
  return (
    <div className="min-h-screen flex flex-col">
      <UnitSystemSync />
      <a
        href="#main"
        className="sr-only rounded bg-paper px-3 py-2 text-sm font-medium text-harbour focus:not-sr-only focus:absolute focus:left-4 focus:top-3 focus:z-50"
      >
        Skip to content
      </a>
      {/* Any page prints without the app's navigation; reports and the excursion review also drop the footer. */}
      <header className="bg-harbour text-paper print:hidden">
        <div
          className="mx-auto flex max-w-screen-2xl flex-wrap items-center gap-x-8 gap-y-3 px-4 py-3 sm:px-6"
          onKeyDown={(event) => {
            if (event.key === 'Escape' && menuOpen) {
              setMenuOpen(false);
              menuButton.current?.focus();
            }
          }}
        >
          <a href="/" className="flex items-baseline gap-2">
            <span className="text-lg font-semibold tracking-wide">Tramontane</span>
            <span className="hidden text-xs text-mist/80 sm:inline">cooling hours, hour by hour</span>
          </a>
          <button
            ref={menuButton}
            type="button"
            className="ml-auto rounded border border-mist/40 px-3 py-1 text-sm text-paper hover:bg-harbour-soft md:hidden"
            aria-expanded={menuOpen}
            aria-controls="main-menu"
            onClick={() => setMenuOpen((open) => !open)}
          >
            Menu <span aria-hidden>{menuOpen ? '▴' : '▾'}</span>
          </button>
          <div
            id="main-menu"
            className={`${menuOpen ? 'flex' : 'hidden'} w-full flex-col gap-3 md:flex md:w-auto md:flex-1 md:flex-row md:items-center md:gap-8`}
          >
            <nav aria-label="Main" className="flex flex-col gap-1 text-sm md:flex-row">
              {items.map((item) => (
                <NavLink
                  key={item.to}
                  to={item.to}
                  end={item.end}
                  className={({ isActive }) => `rounded px-3 py-1.5 ${isActive ? 'bg-harbour-soft text-paper' : 'text-mist/90 hover:bg-harbour-soft/60'}`}
                >
                  {item.label}
                </NavLink>
              ))}
            </nav>
            <div className="flex flex-wrap items-center gap-5 md:ml-auto">
              <HealthIndicator />
              <AccountMenu />
            </div>
          </div>
        </div>
      </header>
      <main
        id="main"
        tabIndex={-1}
        className="mx-auto w-full min-w-0 max-w-screen-2xl flex-1 px-4 py-6 focus:outline-none sm:px-6 print:max-w-none print:px-0 print:py-2"
      >
        <Outlet />
      </main>
      <footer className="border-t border-rule bg-panel">
        <p className="mx-auto max-w-screen-2xl px-4 py-3 text-xs text-ink-soft sm:px-6">
          Results are estimates for comparing designs, not a design. Final design follows local codes, the IT manufacturers' limits and licensed engineering
          review.
        </p>
      </footer>
    </div>
  );
}
