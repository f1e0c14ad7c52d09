import { useMemo, useState } from 'react';
import { useParams } from 'react-router-dom';
import { MoistAirChart } from '@/components/charts/moist-air-chart';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { standardPressurePa } from '../../../../shared/psychrometrics';
import type { EnvelopeLimits } from '../../../../shared/scenario/envelopes';
import { useDeleteEnvelope } from '../api/delete-envelope';
import { useEnvelopePresets, useProjectEnvelopes } from '../api/get-envelopes';
import { useProjectRole } from '@/lib/api/projects';
import { EnvelopeForm } from './envelope-form';
import { formatLimit } from '../lib/limit-format';
import { ProjectCrumb } from '@/components/ui/project-crumb';

interface Entry {
  key: string;
  label: string;
  source: string;
  note: string;
  recalled: boolean;
  limits: EnvelopeLimits;
  projectEnvelopeId?: number;
}

const maxDrawn = 4;
const noHours = { dryBulbC: [], humidityRatio: [] };
const seaLevelPa = standardPressurePa(0);

/** /projects/:projectId/envelopes — the published presets and the project's own, drawn on the moist-air chart. */
export function EnvelopesPage() {
  const projectId = Number(useParams().projectId);
  const { unitSystem } = useUnitSystem();
  const presets = useEnvelopePresets();
  const own = useProjectEnvelopes(projectId);
  const { canEdit } = useProjectRole(projectId);
  const remove = useDeleteEnvelope(projectId);
  const [drawn, setDrawn] = useState<string[]>(['preset:ashrae-2021-recommended', 'preset:ashrae-2021-a1']);

  const entries = useMemo<Entry[]>(
    () => [
      ...(presets.data?.presets ?? []).map((p) => ({
        key: `preset:${p.id}`,
        label: p.label,
        source: p.edition,
        note: p.note,
        recalled: p.recalledFromMemory,
        limits: p.limits,
      })),
      ...(own.data?.envelopes ?? []).map((e) => ({
        key: `own:${e.id}`,
        label: e.name,
        source: `This project, added ${new Date(e.createdAt).toISOString().slice(0, 10)}`,
        note: e.note,
        recalled: false,
        limits: e.limits,
        projectEnvelopeId: e.id,
      })),
    ],
    [presets.data, own.data],
  );
  const chartEnvelopes = useMemo(() => entries.filter((e) => drawn.includes(e.key)).map((e) => ({ label: e.label, limits: e.limits })), [entries, drawn]);
  const toggle = (key: string) => setDrawn((d) => (d.includes(key) ? d.filter((k) => k !== key) : [...d, key].slice(-maxDrawn)));
  const t = unitOf('temperature', unitSystem);

  const group = (title: string, list: Entry[], empty: string) => (
    <Panel title={title}>
      {list.length === 0 ? (
        <p className="text-sm text-ink-soft">{empty}</p>
      ) : (
        <ul className="divide-y divide-rule">
          {list.map((e) => (
            <li key={e.key} className="flex gap-3 py-2" data-testid="envelope-entry">
              <input
                type="checkbox"
                className="mt-1 accent-harbour"
                aria-label={`Draw ${e.label}`}
                checked={drawn.includes(e.key)}
                onChange={() => toggle(e.key)}
              />
              <div className="min-w-0 flex-1">
                <div className="flex items-baseline justify-between gap-2">
                  <p className="font-medium">{e.label}</p>
                  {e.projectEnvelopeId !== undefined && canEdit && (
                    <button
                      type="button"
                      onClick={() =>
                        window.confirm(`Delete the envelope “${e.label}”? Scenarios keep the limits they copied.`) && remove.mutate(e.projectEnvelopeId!)
                      }
                      className="rounded px-2 text-xs text-signal-bad hover:bg-[#fbeceb]"
                    >
                      Delete
                    </button>
                  )}
                </div>
                <p className="num text-xs">
                  {formatLimit('temperature', unitSystem, e.limits.dryBulbMinC)}–{formatLimit('temperature', unitSystem, e.limits.dryBulbMaxC)} {t} dry-bulb ·
                  dew point {formatLimit('temperature', unitSystem, e.limits.dewPointMinC)} to {formatLimit('temperature', unitSystem, e.limits.dewPointMaxC)}{' '}
                  {t} · RH {e.limits.rhMinPct}–{e.limits.rhMaxPct} %
                </p>
                <p className="text-xs text-ink-soft">{e.source}</p>
                {e.note && <p className="text-xs text-ink-faint">{e.note}</p>}
                {e.recalled && <p className="text-xs text-signal-warn">Recalled from memory; check against the guideline before relying on it.</p>}
              </div>
            </li>
          ))}
        </ul>
      )}
    </Panel>
  );

  return (
    <div className="space-y-4">
      <header>
        <ProjectCrumb projectId={projectId} />
        <h1 className="text-xl font-semibold">Inlet envelopes</h1>
      </header>
      {(presets.isError || own.isError) && (
        <Notice tone="bad" title="Envelopes could not be loaded">
          {(presets.error ?? own.error)?.message} Reload the page to try again.
        </Notice>
      )}
      <div className="grid gap-4 xl:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <div className="space-y-4">
          {presets.isPending ? (
            <div role="progressbar" className="h-64 animate-pulse rounded-md bg-mist" aria-label="Loading envelopes" />
          ) : (
            group(
              'Published',
              entries.filter((e) => e.projectEnvelopeId === undefined),
              'No presets.',
            )
          )}
          {group(
            "This project's own",
            entries.filter((e) => e.projectEnvelopeId !== undefined),
            canEdit ? 'None yet. Add one below when a client or manufacturer sets its own limits.' : 'None yet.',
          )}
          {canEdit && (
            <Panel title="Add an envelope">
              <EnvelopeForm projectId={projectId} onCreated={(id) => setDrawn((d) => [...d, `own:${id}`].slice(-maxDrawn))} />
            </Panel>
          )}
        </div>
        <div className="space-y-2 xl:sticky xl:top-4 xl:self-start">
          <Panel title="On the moist-air chart">
            <p className="mb-2 text-xs text-ink-soft">
              Tick up to {maxDrawn} envelopes to draw them. Drawn at sea-level standard pressure; a site's own pressure shifts the moisture lines slightly.
            </p>
            <MoistAirChart pressurePa={seaLevelPa} hours={noHours} envelopes={chartEnvelopes} />
          </Panel>
        </div>
      </div>
    </div>
  );
}
