import { Notice } from './notice';

/** The cautions every set of results carries (product brief). */
export function ResultCautions({ systemKind, evaporative }: { systemKind: string; evaporative: boolean }) {
  return (
    <Notice tone="warn" title="Read these results as estimates">
      <ul className="list-disc space-y-0.5 pl-5">
        <li>They compare designs; they are not a design. Final design follows local codes, the IT manufacturers' limits and licensed engineering review.</li>
        {systemKind === 'direct-air' && (
          <li>Direct outside air brings particulate and gaseous contamination, smoke and condensation risk into the hall.</li>
        )}
        {evaporative && <li>Evaporative systems need water treatment and Legionella control under local rules.</li>}
      </ul>
    </Notice>
  );
}
