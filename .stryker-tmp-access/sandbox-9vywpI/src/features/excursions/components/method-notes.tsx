// @ts-nocheck
import { Notice } from '@/components/ui/notice';
import { ResultCautions } from '@/components/ui/result-cautions';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import type { ExcursionsResponse } from '../api/get-excursions';

/** "How this is worked out": the inlet model for this run's system kind, the counting rules and their sources. */
export function MethodNotes({ data }: { data: ExcursionsResponse }) {
  const { unitSystem } = useUnitSystem();
  const t = (c: number) => formatQuantity('temperature', unitSystem, c);
  const dk = (k: number) => formatQuantity('temperatureDifference', unitSystem, k);
  const kind = data.run.systemKind;
  const hallDewPoint = data.analysis.applied.hallDewPointC;
  return (
    <div className="space-y-2 text-sm text-ink-soft" data-testid="method-notes">
      <p>
        <strong className="text-ink">The inlet follows the controlled supply air.</strong> Each hour of the run's climate file is classified again by the run's
        own rules (free cooling, adiabatic assist, mechanical) with the supply at the float ceiling — the setpoint when nothing floats — so with the run's
        setpoint and envelope the hours per mode are the run's. The IT inlet dry-bulb and moisture of each hour then follow from its mode:
      </p>
      {kind === 'direct-air' && (
        <ul className="list-disc space-y-0.5 pl-5">
          <li>
            Free cooling: outdoor air plus fan heat, mixed with return air so it never falls below the setpoint: max(setpoint, T + fan heat); moisture is the
            outdoor humidity ratio.
          </li>
          <li>
            Free cooling with humidification (outdoor air drier than the lower limit): max(setpoint, T + fan heat), moisture raised to the control envelope's
            lower limit.
          </li>
          <li>
            Adiabatic assist: the air leaving the wetted stage at full effectiveness, T − ε(T − T_wb), plus fan heat, not below the setpoint; moisture where the
            outdoor wet-bulb line reaches that temperature.
          </li>
          <li>Mechanical: the coil holds the setpoint and dehumidifies to the control envelope's upper moisture limit at the setpoint.</li>
        </ul>
      )}
      {kind === 'indirect-air' && (
        <ul className="list-disc space-y-0.5 pl-5">
          <li>
            Free cooling and adiabatic assist: the air-to-air exchanger's steady supply with return = supply + IT temperature rise, S = T_sc + (ΔT_IT(1 − ε_hx)
            + fan heat)/ε_hx, with ε_hx the exchanger’s effectiveness at the scenario’s scavenger air ratio and scavenger air T_sc at the outdoor dry-bulb
            (free) or leaving the wetted stage (adiabatic); never below the setpoint. Fan heat is derived from the fan power: fan power share × IT temperature
            rise.
          </li>
          <li>Mechanical: the setpoint.</li>
          <li>
            Outdoor air never enters the hall: its moisture is assumed held at a dew point of {hallDewPoint === null ? '–' : t(hallDewPoint)}, the middle of the
            recommended range's dew-point limits, by humidity control not modelled here; only dry-bulb excursions can occur.
          </li>
        </ul>
      )}
      {kind === 'water-side' && (
        <ul className="list-disc space-y-0.5 pl-5">
          <li>
            Free cooling and adiabatic assist: the economiser's water (
            {data.run.heatRejection === 'cooling-tower' ? 'outdoor wet-bulb' : "outdoor dry-bulb, or the wetted stage's leaving air"} plus the approach) plus
            the coil's approach of the run (supply setpoint − chilled-water setpoint); never below the setpoint. A float ceiling raises the chilled-water
            setpoint by as much.
          </li>
          <li>Mechanical: the setpoint.</li>
          <li>
            The hall's moisture is assumed held at a dew point of {hallDewPoint === null ? '–' : t(hallDewPoint)}, the middle of the recommended range's
            dew-point limits; only dry-bulb excursions can occur.
          </li>
        </ul>
      )}
      <p>
        An hour is inside an envelope when its inlet dry-bulb, dew point and relative humidity are all within the limits (dry-bulb maxima derated for the site's
        elevation as the guideline describes). An <strong className="text-ink">excursion event</strong> is a run of consecutive hours outside the recommended
        range or the allowable class; an hour without data or a gap in the file ends it. Events a year = events ÷ (hours with data ÷ 8760).
      </p>
      <p>
        <strong className="text-ink">Rate of change.</strong> ASHRAE TC 9.9's thermal guidelines limit the change of inlet dry-bulb for classes A1–A4 to 5 °C in
        any 15 minutes and 20 °C in an hour (recalled from memory, not checked against the guideline text). The climate file is hourly, so only the hourly limit
        can be checked: the change from each hour to the next is compared with {dk(data.reference.hourlyRateLimitK)}. Changes within the hour, including the
        15-minute limit, cannot be seen in hourly data, and the modelled supply moves in steps a real control loop would smooth.
      </p>
      <p>
        <strong className="text-ink">X-factor.</strong> The hourly relative failure rate from the X-factor table above, averaged over the hours with data.
      </p>
    </div>
  );
}

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
