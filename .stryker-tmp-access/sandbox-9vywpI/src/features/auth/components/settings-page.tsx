// @ts-nocheck
import { Link } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';
import { useMe, useUpdateSettings } from '../api/me';
import { useSignOut } from '../api/sign-out';

const unitChoices: { value: UnitSystem; hint: string }[] = [
  { value: 'SI', hint: '°C, g/kg, kJ/kg, kPa' },
  { value: 'IP', hint: '°F, grains/lb, Btu/lb, inHg' },
];

export function SettingsPage() {
  const me = useMe();
  const update = useUpdateSettings();
  const signOutEverywhere = useSignOut(true);
  // The whole app follows the unit system at once; UnitSystemSync saves it to these settings.
  const { unitSystem, setUnitSystem } = useUnitSystem();
  if (me.isPending) return <div role="progressbar" className="h-40 animate-pulse rounded bg-mist" aria-label="Loading settings" />;
  if (me.isError)
    return (
      <Notice tone="bad" title="Settings could not be loaded">
        {me.error.message}
      </Notice>
    );
  const { user, settings, projects } = me.data;
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <Panel title="Your settings">
        <dl className="mb-4 grid grid-cols-[8rem_1fr] gap-y-1 text-sm">
          <dt className="text-ink-soft">Name</dt>
          <dd>{user.name}</dd>
          <dt className="text-ink-soft">E-mail</dt>
          <dd>{user.email}</dd>
          <dt className="text-ink-soft">Organisation</dt>
          <dd>{user.isAdmin ? 'Admin: manages everyone and sees the audit trail' : 'Member'}</dd>
        </dl>
        <fieldset className="mb-4">
          <legend className="mb-2 text-sm font-medium">Units</legend>
          <div className="inline-flex overflow-hidden rounded border border-rule" role="radiogroup" aria-label="Units">
            {unitChoices.map((choice) => (
              <button
                key={choice.value}
                type="button"
                role="radio"
                aria-checked={unitSystem === choice.value}
                onClick={() => setUnitSystem(choice.value)}
                className={`px-4 py-1.5 text-sm ${unitSystem === choice.value ? 'bg-harbour text-paper' : 'bg-panel text-ink hover:bg-mist'}`}
              >
                {choice.value}
              </button>
            ))}
          </div>
          <p className="mt-1 text-xs text-ink-faint">{unitChoices.find((c) => c.value === unitSystem)?.hint}</p>
        </fieldset>
        <label className="flex items-start gap-2 text-sm">
          <input
            type="checkbox"
            className="mt-0.5 accent-harbour"
            checked={settings.runNotices}
            onChange={(e) => update.mutate({ runNotices: e.target.checked })}
          />
          <span>
            E-mail me when a run I can see has finished
            <span className="block text-xs text-ink-faint">Sent to {user.email}. Off unless you turn it on.</span>
          </span>
        </label>
        {update.isError && (
          <div className="mt-3">
            <Notice tone="bad" title="Not saved">
              {update.error.message}
            </Notice>
          </div>
        )}
      </Panel>

      <Panel title="Your projects">
        {projects.length === 0 ? (
          <p className="text-sm text-ink-soft">You are not in any project yet. A project owner can invite you by e-mail.</p>
        ) : (
          <table className="w-full text-sm">
            <thead className="text-left text-xs text-ink-faint">
              <tr>
                <th className="py-1 font-medium">Project</th>
                <th className="py-1 font-medium">Your role</th>
                <th className="py-1" />
              </tr>
            </thead>
            <tbody className="divide-y divide-rule">
              {projects.map((p) => (
                <tr key={p.id}>
                  <td className="py-1.5">{p.name}</td>
                  <td className="py-1.5 capitalize">{p.role}</td>
                  <td className="py-1.5 text-right">
                    <Link className="text-harbour-soft underline" to={`/projects/${p.id}/members`}>
                      Members
                    </Link>
                    {p.role === 'owner' && (
                      <Link className="ml-3 text-harbour-soft underline" to={`/projects/${p.id}/audit`}>
                        Audit trail
                      </Link>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Panel>

      <Panel title="Sessions">
        <p className="mb-3 text-sm text-ink-soft">
          A session ends after three days without use, and after thirty days in any case. Signing out everywhere ends every session you have, on every device,
          including this one.
        </p>
        <button
          type="button"
          onClick={() => signOutEverywhere.mutate()}
          disabled={signOutEverywhere.isPending}
          className="rounded border border-signal-bad/50 px-3 py-1.5 text-sm text-signal-bad hover:bg-[#fbeceb] disabled:opacity-60"
        >
          Sign out everywhere
        </button>
      </Panel>
    </div>
  );
}
