// @ts-nocheck
import { useState, type FormEvent } from 'react';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { projectRoles, type ProjectRole } from '../api/get-members';
import { useInvites } from '../api/get-invites';
import { useRevokeInvite } from '../api/revoke-invite';
import { useSendInvite } from '../api/send-invite';

const statusTone: Record<string, string> = {
  pending: 'text-harbour-soft',
  accepted: 'text-signal-ok',
  expired: 'text-ink-faint',
  revoked: 'text-ink-faint',
};

/** Invite by e-mail (owners), and the invitations sent so far. Others see why they cannot. */
export function InvitesPanel({ projectId, canManage }: { projectId: number; canManage: boolean }) {
  const invites = useInvites(projectId, canManage);
  const send = useSendInvite(projectId);
  const revoke = useRevokeInvite(projectId);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<ProjectRole>('viewer');
  const [sentTo, setSentTo] = useState<string | null>(null);

  function submit(event: FormEvent) {
    event.preventDefault();
    setSentTo(null);
    send.mutate(
      { email, role },
      {
        onSuccess: ({ invite }) => {
          setSentTo(invite.email);
          setEmail('');
        },
      },
    );
  }

  return (
    <Panel title="Invite by e-mail">
      <form onSubmit={submit} className="space-y-2" aria-label="Invite by e-mail">
        <fieldset disabled={!canManage || send.isPending} className="flex flex-wrap items-end gap-2 disabled:opacity-60">
          <label className="flex-1 text-xs text-ink-soft">
            E-mail
            <input
              type="email"
              required
              value={email}
              onChange={(e) => setEmail(e.target.value)}
              placeholder="colleague@firm.example"
              className="mt-0.5 block w-full rounded border border-rule bg-panel px-2 py-1.5 text-sm text-ink"
            />
          </label>
          <label className="text-xs text-ink-soft">
            Role
            <select
              value={role}
              onChange={(e) => setRole(e.target.value as ProjectRole)}
              className="mt-0.5 block rounded border border-rule bg-panel px-2 py-1.5 text-sm text-ink"
            >
              {projectRoles.map((r) => (
                <option key={r} value={r}>
                  {r}
                </option>
              ))}
            </select>
          </label>
          <button type="submit" className="rounded bg-harbour px-3 py-1.5 text-sm text-paper hover:bg-harbour-soft">
            Send invitation
          </button>
        </fieldset>
        {!canManage && <p className="text-xs text-ink-faint">Only owners can invite.</p>}
        <p className="text-xs text-ink-faint">The link works once, for seven days, for the person who signs in with that e-mail.</p>
      </form>
      {sentTo && (
        <div className="mt-3">
          <Notice title="Invitation sent">An e-mail with the link is on its way to {sentTo}.</Notice>
        </div>
      )}
      {send.isError && (
        <div className="mt-3">
          <Notice tone="bad" title="Not sent">
            {send.error.message}
          </Notice>
        </div>
      )}
      {canManage && invites.data && invites.data.invites.length > 0 && (
        <table className="mt-4 w-full text-sm">
          <thead className="text-left text-xs text-ink-faint">
            <tr>
              <th className="py-1 font-medium">Sent to</th>
              <th className="py-1 font-medium">Role</th>
              <th className="py-1 font-medium">Status</th>
              <th className="py-1" />
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {invites.data.invites.map((invite) => (
              <tr key={invite.id}>
                <td className="py-1.5 pr-3">{invite.email}</td>
                <td className="py-1.5 pr-3">{invite.role}</td>
                <td className={`py-1.5 ${statusTone[invite.status]}`}>
                  {invite.status}
                  {invite.status === 'pending' && <span className="num ml-1 text-xs text-ink-faint">until {invite.expiresAt.slice(0, 10)}</span>}
                </td>
                <td className="py-1.5 text-right">
                  {invite.status === 'pending' && (
                    <button type="button" onClick={() => revoke.mutate(invite.id)} className="rounded px-2 py-1 text-xs text-signal-bad hover:bg-[#fbeceb]">
                      Withdraw
                    </button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </Panel>
  );
}
