// @ts-nocheck
import { useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useChangeMemberRole } from '../api/change-member-role';
import { projectRoles, useMembers, type Member, type MembersAnswer } from '../api/get-members';
import { useRemoveMember } from '../api/remove-member';
import { InvitesPanel } from './invites-panel';

export const roleHelp: Record<string, string> = {
  owner: 'members and roles, deleting the project, and everything an engineer does',
  engineer: 'sites, climate files, envelopes, scenarios and runs',
  viewer: 'reads results and downloads reports',
};

export function MembersPage() {
  const projectId = Number(useParams().projectId);
  const members = useMembers(projectId);
  if (members.isPending) return <div role="progressbar" className="h-40 animate-pulse rounded bg-mist" aria-label="Loading members" />;
  if (members.isError)
    return (
      <Notice tone="bad" title="Members could not be loaded">
        {members.error.message}
      </Notice>
    );
  const answer = members.data;
  return (
    <div className="space-y-6">
      <div>
        <p className="text-xs uppercase tracking-wide text-ink-faint">Project</p>
        <h1 className="text-xl font-semibold">{answer.project.name}</h1>
      </div>
      {!answer.canManage && (
        <Notice title={`You are ${answer.yourRole === 'viewer' ? 'a' : 'an'} ${answer.yourRole} here`}>
          Only the project's owners can invite people or change roles. Ask an owner if someone needs access.
        </Notice>
      )}
      <div className="grid gap-6 xl:grid-cols-[3fr_2fr]">
        <MembersTable projectId={projectId} answer={answer} />
        <InvitesPanel projectId={projectId} canManage={answer.canManage} />
      </div>
      <Panel title="What each role may do">
        <dl className="grid grid-cols-[6rem_1fr] gap-y-1 text-sm">
          {projectRoles.map((role) => (
            <div key={role} className="contents">
              <dt className="font-medium capitalize">{role}</dt>
              <dd className="text-ink-soft">{roleHelp[role]}</dd>
            </div>
          ))}
        </dl>
      </Panel>
    </div>
  );
}

function MembersTable({ projectId, answer }: { projectId: number; answer: MembersAnswer }) {
  const changeRole = useChangeMemberRole(projectId);
  const remove = useRemoveMember(projectId);
  const owners = answer.members.filter((m) => m.role === 'owner').length;
  const lastOwnerReason = (m: Member) => (m.role === 'owner' && owners === 1 ? 'A project keeps at least one owner.' : undefined);
  const error = changeRole.error ?? remove.error;
  return (
    <Panel title={`Members · ${answer.members.length}`}>
      {error && (
        <div className="mb-3">
          <Notice tone="bad" title="Not changed">
            {error.message}
          </Notice>
        </div>
      )}
      <table className="w-full text-sm">
        <thead className="text-left text-xs text-ink-faint">
          <tr>
            <th className="py-1 font-medium">Name</th>
            <th className="py-1 font-medium">E-mail</th>
            <th className="py-1 font-medium">Role</th>
            {answer.canManage && <th className="py-1" />}
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {answer.members.map((m) => (
            <tr key={m.userId}>
              <td className="py-1.5">{m.name}</td>
              <td className="py-1.5 text-ink-soft">{m.email}</td>
              <td className="py-1.5">
                {answer.canManage ? (
                  <select
                    aria-label={`Role of ${m.name}`}
                    value={m.role}
                    disabled={Boolean(lastOwnerReason(m)) || changeRole.isPending}
                    title={lastOwnerReason(m)}
                    onChange={(e) => changeRole.mutate({ userId: m.userId, role: e.target.value as Member['role'] })}
                    className="rounded border border-rule bg-panel px-2 py-1 text-sm disabled:opacity-60"
                  >
                    {projectRoles.map((role) => (
                      <option key={role} value={role}>
                        {role}
                      </option>
                    ))}
                  </select>
                ) : (
                  <span className="capitalize">{m.role}</span>
                )}
              </td>
              {answer.canManage && (
                <td className="py-1.5 text-right">
                  <button
                    type="button"
                    disabled={Boolean(lastOwnerReason(m)) || remove.isPending}
                    title={lastOwnerReason(m) ?? `Remove ${m.name} from the project`}
                    onClick={() => remove.mutate(m.userId)}
                    className="rounded px-2 py-1 text-xs text-signal-bad hover:bg-[#fbeceb] disabled:text-ink-faint disabled:hover:bg-transparent"
                  >
                    Remove
                  </button>
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </Panel>
  );
}
