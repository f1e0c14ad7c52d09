// @ts-nocheck
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { proposalQuerySchema, RUN_ENVELOPE, type ProposalQuery } from '../../../../shared/excursions/proposal-query';
import { deratedDryBulbMaxC, findEnvelopePreset } from '../../../../shared/scenario/envelopes';
import { proposalSearch, useExcursions, type ExcursionsResponse } from '../api/get-excursions';
import { CauseTable, ExcursionFigures, ModeChangeTable } from './excursion-figures';
import { EnvelopesApplied, EventHistogram, XFactorTable } from './excursion-tables';
import { ExcursionCautions, MethodNotes } from './method-notes';
import { ProposalForm } from './proposal-form';

// Printing takes the page to a change review: the app's header, footer and the form stay off paper.
const printStyles = `@media print {
  body header.bg-harbour, body footer, [data-print="hide"] { display: none !important; }
  main { max-width: none !important; padding: 0 !important; }
  section, [data-print="keep"] { break-inside: avoid; }
  @page { margin: 14mm; }
}`;

/** The proposal from the address; anything that does not parse is dropped here and the server's default used. */
function readProposal(search: URLSearchParams): ProposalQuery {
  const raw = Object.fromEntries([...search.entries()].filter(([key]) => ['supplyAirC', 'floatUpToC', 'control', 'recommended', 'allowable'].includes(key)));
  const parsed = proposalQuerySchema.safeParse(raw);
  return parsed.success ? parsed.data : {};
}

/** /projects/:projectId/runs/:runId/excursions?supplyAirC=…&floatUpToC=…&control=…&recommended=…&allowable=… */
export function ExcursionsPage() {
  const params = useParams();
  const projectId = Number(params.projectId);
  const runId = Number(params.runId);
  const [search, setSearch] = useSearchParams();
  const proposal = readProposal(search);
  const query = useExcursions(projectId, runId, proposal);
  const data = query.data;

  const submit = (next: ProposalQuery) => setSearch(new URLSearchParams(proposalSearch(next)), { replace: false });

  return (
    <div className="space-y-4" data-testid="excursions-page">
      <style>{printStyles}</style>
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <div data-print="hide">
            <ProjectCrumb projectId={projectId} />
          </div>
          <h1 className="text-xl font-semibold">Inlet excursions for a proposed change</h1>
          {data && (
            <p className="text-sm text-ink-soft">
              Run {data.run.id} · {data.run.scenarioName} · {data.run.siteName} · {data.run.climateName}
            </p>
          )}
        </div>
        <div className="flex items-center gap-2 text-sm" data-print="hide">
          <Link to={`/projects/${projectId}/runs/${runId}`} className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist">
            Back to the run
          </Link>
          <button
            type="button"
            onClick={() => window.print()}
            disabled={!data}
            className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist disabled:opacity-60"
          >
            Print for a change review
          </button>
        </div>
      </header>

      {query.isPending && <div role="progressbar" className="h-96 animate-pulse rounded-md bg-mist" aria-label="Working out excursions" />}
      {query.isError && (
        <Notice tone="bad" title="The excursions could not be worked out">
          {query.error.message}{' '}
          {query.error.message.includes('is queued') || query.error.message.includes('is running')
            ? 'Wait for the run to finish, then reload.'
            : 'Check the proposal, or open the run again from the project.'}
        </Notice>
      )}
      {data && <Results data={data} proposal={proposal} busy={query.isFetching} onSubmit={submit} />}
    </div>
  );
}

function Results({
  data,
  proposal,
  busy,
  onSubmit,
}: {
  data: ExcursionsResponse;
  proposal: ProposalQuery;
  busy: boolean;
  onSubmit: (q: ProposalQuery) => void;
}) {
  const { unitSystem } = useUnitSystem();
  const t = (c: number) => formatQuantity('temperature', unitSystem, c);
  const p = data.proposal;
  const current = { ...proposal, supplyAirC: p.supplyAirC, control: p.control.id, recommended: p.recommended.id, allowable: p.allowable.id };
  return (
    <>
      <div data-print="hide">
        <Panel title="Proposal">
          <ProposalForm
            key={`${unitSystem}:${JSON.stringify(current)}`}
            current={current}
            onSubmit={onSubmit}
            busy={busy}
            allowableMaxC={(id) => {
              // The run's own envelope is known here only when it is the one the answer was worked out for.
              const limits =
                id === data.proposal.allowable.id ? data.proposal.allowable.limits : id === RUN_ENVELOPE ? null : (findEnvelopePreset(id)?.limits ?? null);
              return limits ? deratedDryBulbMaxC(limits.dryBulbMaxC, data.run.elevationM, limits.altitudeDerating) : null;
            }}
          />
        </Panel>
      </div>
      <p className="text-sm" data-testid="proposal-summary">
        <strong>Proposal:</strong> supply setpoint {t(p.supplyAirC)}
        {p.supplyAirC !== data.run.supplyAirC && <> (the run has {t(data.run.supplyAirC)})</>}
        {p.floatUpToC !== null ? <>, floating up to {t(data.analysis.applied.ceilingC)} before evaporative cooling or compressors start</> : <>, held</>};
        controls work to {p.control.id === 'run' ? "the run's envelope" : p.control.label}; checked against {p.recommended.label} and {p.allowable.label}.
      </p>
      <ExcursionFigures data={data} />
      <div className="grid gap-4 xl:grid-cols-3">
        <Panel title="Excursion events by duration">
          <EventHistogram data={data} />
        </Panel>
        <Panel title="Why hours are outside">
          <CauseTable data={data} />
        </Panel>
        <Panel title="Hours per mode, as run and proposed">
          <ModeChangeTable data={data} />
        </Panel>
      </div>
      <Panel title="Envelopes as applied">
        <EnvelopesApplied data={data} />
      </Panel>
      <Panel title="X-factor: relative failure rate against inlet dry-bulb">
        <XFactorTable data={data} />
      </Panel>
      <Panel title="How this is worked out">
        <MethodNotes data={data} />
      </Panel>
      <ExcursionCautions data={data} />
    </>
  );
}
