import { MethodText } from '@/components/ui/method-text';
import { Notice } from '@/components/ui/notice';
import { ResultCautions } from '@/components/ui/result-cautions';
import type { MethodPart } from '@/lib/method-doc';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import type { ExcursionsResponse } from '../api/get-excursions';

/**
 * "How this is worked out": the inlet model for this run's system kind, the counting rules and their sources. The text is
 * docs/method.md's ("Inlet excursions"); the figures of this run (the hall's dew point, the hourly limit) are added here
 * in the reader's units.
 */
export function MethodNotes({ data }: { data: ExcursionsResponse }) {
  const { unitSystem } = useUnitSystem();
  const t = (c: number) => formatQuantity('temperature', unitSystem, c);
  const dk = (k: number) => formatQuantity('temperatureDifference', unitSystem, k);
  const kind = data.run.systemKind;
  const hallDewPoint = data.analysis.applied.hallDewPointC;
  const heatRejection = data.run.heatRejection === 'cooling-tower' ? 'a cooling tower' : 'a dry cooler';
  return (
    <div className="space-y-2 text-sm text-ink-soft" data-testid="method-notes">
      <MethodText part="inlet-model" />
      <MethodText part={inletParts[kind]} />
      {kind !== 'direct-air' && <MethodText part="inlet-hall-moisture" />}
      <p data-testid="method-notes-run">
        <strong className="text-ink">This run:</strong> {kindWords[kind]}
        {kind === 'water-side' && ` with ${heatRejection}`}
        {kind !== 'direct-air' && <>; the hall's dew point is taken as {hallDewPoint === null ? '–' : t(hallDewPoint)}</>}; the hourly change of inlet dry-bulb
        is compared with {dk(data.reference.hourlyRateLimitK)}.
      </p>
      <MethodText part="excursion-counting" />
    </div>
  );
}

const inletParts: Record<ExcursionsResponse['run']['systemKind'], MethodPart> = {
  'direct-air': 'inlet-direct-air',
  'indirect-air': 'inlet-indirect-air',
  'water-side': 'inlet-water-side',
};

const kindWords: Record<ExcursionsResponse['run']['systemKind'], string> = {
  'direct-air': 'direct outdoor air',
  'indirect-air': 'an indirect air-to-air exchanger',
  'water-side': 'a water-side economiser',
};

/** The cautions every set of results carries (product brief), and the one an inlet estimate adds. */
export function ExcursionCautions({ data }: { data: ExcursionsResponse }) {
  const evaporative = data.run.evaporativeEffectiveness > 0 || data.run.heatRejection === 'cooling-tower';
  return (
    <div className="space-y-3">
      <Notice tone="warn" title="The inlet here is modelled, not measured">
        The model is a steady hour-by-hour picture of the supply air; hot spots, recirculation, control overshoot and failures are not in it. Check a change
        against measured inlet temperatures as well.
      </Notice>
      <ResultCautions systemKind={data.run.systemKind} evaporative={evaporative} />
    </div>
  );
}
