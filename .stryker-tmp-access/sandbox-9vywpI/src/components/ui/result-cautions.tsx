// @ts-nocheck
import { Notice } from './notice';

/** The cautions every set of results carries (product brief). */
/**
 * `systemKind` is the kind of the system that conditions the hall air (a hybrid's air loop); `hybrid` adds the
 * liquid-cooling cautions.
 */
export function ResultCautions({ systemKind, evaporative, hybrid = false }: { systemKind: string; evaporative: boolean; hybrid?: boolean }) {
  return (
    <Notice tone="warn" title="Read these results as estimates">
      <ul className="list-disc space-y-0.5 pl-5">
        <li>They compare designs; they are not a design. Final design follows local codes, the IT manufacturers' limits and licensed engineering review.</li>
        {systemKind === 'direct-air' && <li>Direct outside air brings particulate and gaseous contamination, smoke and condensation risk into the hall.</li>}
        {evaporative && <li>Evaporative systems need water treatment and Legionella control under local rules.</li>}
        {hybrid && (
          <>
            <li>
              Liquid-cooled equipment sets its own coolant limits (flow, pressure, temperature, water chemistry) from its maker, and they come before the
              facility-water class.
            </li>
            <li>Freeze protection of outdoor loops (glycol) changes heat transfer and pumping; it is not modelled here.</li>
          </>
        )}
      </ul>
    </Notice>
  );
}
