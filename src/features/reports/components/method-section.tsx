import { MethodText } from '@/components/ui/method-text';
import type { MethodPart } from '@/lib/method-doc';
import type { ReportRun } from '../../../../shared/report/report-data';
import { SubHeading } from './report-layout';

type SystemKind = ReportRun['scenario']['system']['kind'];

/** The parts of docs/method.md that state each system kind's classification rule. */
const classificationParts: Record<SystemKind, MethodPart[]> = {
  'direct-air': ['classify-direct-air'],
  'indirect-air': ['classify-indirect-air', 'exchanger'],
  'water-side': ['classify-water-side'],
  hybrid: ['classify-hybrid'],
};

/** The classification rules a run uses: its own kind's, and for a hybrid also its loops'. */
function kindsOf(system: ReportRun['scenario']['system']): SystemKind[] {
  return system.kind === 'hybrid' ? ['hybrid', 'water-side', system.air.kind] : [system.kind];
}

const ENGINE_1 = 'scenario-engine 1.0.0';

/**
 * How the figures were computed, with the equations and their sources. The text is docs/method.md's (the one place the
 * method is written); what depends on the runs — which engines made them, which system kinds they use — is chosen here.
 */
export function MethodSection({ runs }: { runs: ReportRun[] }) {
  const kinds = [...new Set(runs.flatMap((r) => kindsOf(r.scenario.system)))];
  const engines = [...new Set(runs.map((r) => r.engineVersion))];
  const parts = [...new Set(kinds.flatMap((kind) => classificationParts[kind]))];
  return (
    <div className="space-y-3 text-sm leading-relaxed" data-testid="report-method">
      <p>
        Every hour of the climate file is classified on its own, then the hours are summed. Hours without usable data are counted as no data, never guessed.
        Engine version {engines.join(', ')}.
      </p>
      <SubHeading>Moist air at the site's pressure</SubHeading>
      <MethodText part="moist-air" />
      <SubHeading>Inlet envelope</SubHeading>
      <MethodText part="envelope-limits" />
      <SubHeading>Classifying each hour</SubHeading>
      <MethodText part="symbols" className="text-ink-soft" />
      <MethodText part="classification" />
      {parts.map((part) => (
        <MethodText key={part} part={part} />
      ))}
      <MethodText part="mechanical-fraction" />
      <SubHeading>Energy and water per hour</SubHeading>
      {engines.some((e) => e !== ENGINE_1) && (
        <>
          <MethodText part="fan-heat" />
          <MethodText part="energy-and-water" />
        </>
      )}
      {engines.includes(ENGINE_1) && <MethodText part="engine-1" />}
      <MethodText part="results" />
      <div className="keep-together">
        <SubHeading>Sources</SubHeading>
        <MethodText part="sources" />
      </div>
    </div>
  );
}

/** What the model leaves out, beside the product's cautions (docs/method.md, "Limits of the model"). */
export function ModelLimits() {
  return <MethodText part="limits" className="text-sm text-ink-soft" />;
}
