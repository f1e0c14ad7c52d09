import { NavLink, Outlet } from 'react-router-dom';
import { HealthIndicator } from '@/features/health/components/health-indicator';
import { AccountMenu, useAdminNavItems } from '@/features/auth/components/account-menu';
import { UnitSystemSync } from '@/features/auth/components/unit-system-sync';

const nav = [
  { to: '/', label: 'Projects', end: true },
  { to: '/calculator', label: 'Air-state calculator' },
];

export function AppShell() {
  const items = [...nav, ...useAdminNavItems()];
  return (
    <div className="min-h-screen flex flex-col">
      <UnitSystemSync />
      {/* Any page prints without the app's navigation; reports and the excursion review also drop the footer. */}
      <header className="bg-harbour text-paper print:hidden">
        <div className="mx-auto flex max-w-screen-2xl items-center gap-8 px-6 py-3">
          <a href="/" className="flex items-baseline gap-2">
            <span className="text-lg font-semibold tracking-wide">Tramontane</span>
            <span className="text-xs text-mist/80">cooling hours, hour by hour</span>
          </a>
          <nav aria-label="Main" className="flex gap-1 text-sm">
            {items.map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end={item.end}
                className={({ isActive }) =>
                  `rounded px-3 py-1.5 ${isActive ? 'bg-harbour-soft text-paper' : 'text-mist/90 hover:bg-harbour-soft/60'}`
                }
              >
                {item.label}
              </NavLink>
            ))}
          </nav>
          <div className="ml-auto flex items-center gap-5">
            <HealthIndicator />
            <AccountMenu />
          </div>
        </div>
      </header>
      <main className="mx-auto w-full max-w-screen-2xl flex-1 px-6 py-6 print:max-w-none print:px-0 print:py-2">
        <Outlet />
      </main>
      <footer className="border-t border-rule bg-panel">
        <p className="mx-auto max-w-screen-2xl px-6 py-3 text-xs text-ink-soft">
          Results are estimates for comparing designs, not a design. Final design follows local codes, the IT
          manufacturers' limits and licensed engineering review.
        </p>
      </footer>
    </div>
  );
}
