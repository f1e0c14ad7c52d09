// @ts-nocheck
import { useState, type FormEvent } from 'react';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useCreateShareLink } from '../api/create-share-link';
import { useShareLinks, type ShareLink } from '../api/list-share-links';
import { useRevokeShareLink } from '../api/revoke-share-link';

const day = 86_400_000;
const maxPublicDays = 90;
const isoDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

const stateWords: Record<ShareLink['state'], { text: string; style: string }> = {
  members: { text: 'members only', style: 'bg-mist text-ink' },
  public: { text: 'public', style: 'bg-signal-warn text-paper' },
  'public-ended': { text: 'public period ended: members only', style: 'bg-mist text-ink' },
  revoked: { text: 'revoked', style: 'bg-rule text-ink' },
};

/** The end of the chosen day on this computer's clock, kept within the server's 90 days. */
function publicUntilIso(date: string, nowMs: number): string {
  const endOfDay = new Date(`${date}T23:59:59`).getTime();
  return new Date(Math.min(endOfDay, nowMs + maxPublicDays * day - 60_000)).toISOString();
}

function LinkRow({ link, onRevoke, busy }: { link: ShareLink; onRevoke: (id: number) => void; busy: boolean }) {
  const state = stateWords[link.state];
  return (
    <li className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-rule/60 py-1.5 text-sm" data-testid="share-link">
      <span className="font-medium">{link.title}</span>
      <span className={`rounded px-1.5 py-0.5 text-xs ${state.style}`}>{state.text}</span>
      <span className="text-xs text-ink-soft">
        {link.target === 'run' ? `run ${link.runIds[0]}` : `runs ${link.runIds.join(', ')}`}
        {link.publicUntil && link.state === 'public' && ` · public until ${link.publicUntil.slice(0, 10)}`} · made {link.createdAt.slice(0, 10)}
        {link.createdByName && ` by ${link.createdByName}`}
      </span>
      {link.state !== 'revoked' && (
        <button
          type="button"
          disabled={busy}
          onClick={() => window.confirm(`Revoke “${link.title}”? Anyone who opens it afterwards is told it was revoked.`) && onRevoke(link.id)}
          className="ml-auto rounded border border-signal-bad/50 px-2 py-0.5 text-xs text-signal-bad hover:bg-[#fbeceb] disabled:opacity-50"
        >
          Revoke
        </button>
      )}
    </li>
  );
}

/** For owners: make a read-only link to this report, see the links made so far, revoke them. */
export function ShareLinksPanel({
  projectId,
  target,
  runIds,
  defaultTitle,
}: {
  projectId: number;
  target: ShareLink['target'];
  runIds: number[];
  defaultTitle: string;
}) {
  const links = useShareLinks(projectId, true);
  const create = useCreateShareLink(projectId);
  const revoke = useRevokeShareLink(projectId);
  const [title, setTitle] = useState(defaultTitle);
  const [audience, setAudience] = useState<'members' | 'public'>('members');
  // The clock is read once, when the panel opens: the date box's default and bounds must not move between renders.
  const [nowMs] = useState(() => Date.now());
  const [until, setUntil] = useState(isoDay(nowMs + 14 * day));
  const [made, setMade] = useState<string | null>(null);
  const [copied, setCopied] = useState(false);
  const sameReport = (l: ShareLink) => l.target === target && l.runIds.join(',') === runIds.join(',');
  const all = links.data?.links ?? [];

  function submit(event: FormEvent) {
    event.preventDefault();
    setCopied(false);
    create.mutate(
      { target, runIds, title: title.trim(), publicUntil: audience === 'public' ? publicUntilIso(until, Date.now()) : null },
      { onSuccess: (res) => setMade(`${window.location.origin}${res.path}`) },
    );
  }

  return (
    <div className="mx-auto mb-4 max-w-[62rem] print:hidden" data-testid="share-panel">
      <Panel title="Share this report read-only">
        <form onSubmit={submit} className="grid gap-3 text-sm md:grid-cols-[1fr_auto]">
          <div className="space-y-2">
            <label className="block">
              <span className="text-ink-soft">Title readers see</span>
              <input
                value={title}
                onChange={(e) => setTitle(e.target.value)}
                required
                maxLength={200}
                className="mt-0.5 block w-full rounded border border-rule px-2 py-1"
              />
            </label>
            <fieldset className="space-y-1">
              <legend className="text-ink-soft">Who can open it</legend>
              <label className="flex items-center gap-2">
                <input type="radio" name="audience" className="accent-harbour" checked={audience === 'members'} onChange={() => setAudience('members')} />
                Signed-in members of this project
              </label>
              <label className="flex flex-wrap items-center gap-2">
                <input type="radio" name="audience" className="accent-harbour" checked={audience === 'public'} onChange={() => setAudience('public')} />
                Anyone with the link, until
                <input
                  type="date"
                  aria-label="Public until"
                  value={until}
                  min={isoDay(nowMs + day)}
                  max={isoDay(nowMs + (maxPublicDays - 1) * day)}
                  onChange={(e) => {
                    setUntil(e.target.value);
                    setAudience('public');
                  }}
                  className="rounded border border-rule px-2 py-0.5"
                />
                <span className="text-xs text-ink-soft">(at most {maxPublicDays} days; members keep access after)</span>
              </label>
            </fieldset>
          </div>
          <div className="self-end">
            <button type="submit" disabled={create.isPending} className="rounded bg-harbour px-3 py-1.5 text-paper hover:bg-harbour-soft disabled:opacity-50">
              Create link
            </button>
          </div>
        </form>
        {create.isError && (
          <div className="mt-3">
            <Notice tone="bad" title="The link was not made">
              {create.error.message}
            </Notice>
          </div>
        )}
        {made && (
          <div className="mt-3 space-y-1 rounded border border-harbour-soft/40 bg-mist p-3 text-sm" data-testid="new-share-link">
            <p className="font-medium">Copy the link now: it is shown only this once (Tramontane keeps only a fingerprint of it).</p>
            <div className="flex gap-2">
              <input
                readOnly
                value={made}
                aria-label="New share link"
                className="num w-full rounded border border-rule bg-panel px-2 py-1 text-xs"
                onFocus={(e) => e.target.select()}
              />
              <button
                type="button"
                className="rounded border border-rule bg-panel px-2 py-1 text-xs hover:bg-paper"
                onClick={() =>
                  void navigator.clipboard?.writeText(made).then(
                    () => setCopied(true),
                    () => setCopied(false),
                  )
                }
              >
                {copied ? 'Copied' : 'Copy'}
              </button>
            </div>
          </div>
        )}
        <div className="mt-4">
          <h3 className="text-sm font-semibold">Links to this report</h3>
          {links.isPending && <div role="progressbar" className="mt-1 h-10 animate-pulse rounded bg-mist" aria-label="Loading links" />}
          {links.isError && (
            <Notice tone="bad" title="Links could not be loaded">
              {links.error.message}
            </Notice>
          )}
          {links.data && all.filter(sameReport).length === 0 && (
            <p className="text-sm text-ink-soft">None yet. Create one above to hand this report to a reviewer.</p>
          )}
          <ul>
            {all.filter(sameReport).map((link) => (
              <LinkRow key={link.id} link={link} busy={revoke.isPending} onRevoke={(id) => revoke.mutate(id)} />
            ))}
          </ul>
          {all.some((l) => !sameReport(l)) && (
            <details className="mt-2 text-sm">
              <summary className="cursor-pointer text-ink-soft">Other report links in this project ({all.filter((l) => !sameReport(l)).length})</summary>
              <ul>
                {all
                  .filter((l) => !sameReport(l))
                  .map((link) => (
                    <LinkRow key={link.id} link={link} busy={revoke.isPending} onRevoke={(id) => revoke.mutate(id)} />
                  ))}
              </ul>
            </details>
          )}
          {revoke.isError && (
            <Notice tone="bad" title="The link was not revoked">
              {revoke.error.message}
            </Notice>
          )}
        </div>
      </Panel>
    </div>
  );
}
