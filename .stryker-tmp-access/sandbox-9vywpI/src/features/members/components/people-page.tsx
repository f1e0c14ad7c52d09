// @ts-nocheck
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { usePeople } from '../api/get-people';
import { useSetAdmin } from '../api/set-admin';

/** Everyone in the installation, for admins: who is an admin, and when each last signed in. */
export function PeoplePage() {
  const people = usePeople();
  const setAdmin = useSetAdmin();
  if (people.isPending) return <div role="progressbar" className="h-40 animate-pulse rounded bg-mist" aria-label="Loading people" />;
  if (people.isError)
    return (
      <Notice tone="bad" title="People could not be loaded">
        {people.error.message}
      </Notice>
    );
  const admins = people.data.people.filter((p) => p.isAdmin).length;
  return (
    <Panel title={`People · ${people.data.people.length}`}>
      {setAdmin.isError && (
        <div className="mb-3">
          <Notice tone="bad" title="Not changed">
            {setAdmin.error.message}
          </Notice>
        </div>
      )}
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead className="text-left text-xs text-ink-faint">
            <tr>
              <th className="py-1 font-medium">Name</th>
              <th className="py-1 font-medium">E-mail</th>
              <th className="py-1 font-medium">Last sign-in (UTC)</th>
              <th className="py-1 font-medium">Organisation admin</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {people.data.people.map((p) => {
              const lastAdmin = p.isAdmin && admins === 1;
              return (
                <tr key={p.id}>
                  <td className="py-1.5">{p.name}</td>
                  <td className="py-1.5 text-ink-soft">{p.email}</td>
                  <td className="num py-1.5 text-xs">{p.lastSignInAt ? p.lastSignInAt.slice(0, 16).replace('T', ' ') : 'never'}</td>
                  <td className="py-1.5">
                    <label className="inline-flex items-center gap-2" title={lastAdmin ? 'The installation keeps at least one admin.' : undefined}>
                      <input
                        type="checkbox"
                        className="accent-harbour"
                        aria-label={`${p.name} is an organisation admin`}
                        checked={p.isAdmin}
                        disabled={lastAdmin || setAdmin.isPending}
                        onChange={(e) => setAdmin.mutate({ userId: p.id, isAdmin: e.target.checked })}
                      />
                      <span className="text-xs text-ink-faint">{lastAdmin ? 'last admin' : p.isAdmin ? 'admin' : ''}</span>
                    </label>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </Panel>
  );
}
