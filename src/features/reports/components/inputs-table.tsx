import { formatInputValue } from '@/lib/input-value';
import type { UnitSystem } from '@/lib/unit-system';
import { scenarioInputRows, type InputRow } from '../../../../shared/report/inputs';
import { inputLabel } from '../../../../shared/scenario/input-labels';
import type { ReportRun } from '../../../../shared/report/report-data';
import { ReportTable, SubHeading } from './report-layout';

function shown(row: InputRow | undefined, system: UnitSystem): string {
  return row ? formatInputValue(row, system) : '–';
}

const groups = [
  { prefix: 'system.', title: 'Cooling system' },
  { prefix: 'envelope.', title: 'Inlet envelope' },
  { prefix: 'energy.', title: 'Energy and water' },
  { prefix: '', title: 'Scenario' },
];

/**
 * The scenario inputs exactly as run, by group: each by its plain name, with its field name in the scenario JSON
 * beneath (what the command line reads). With several runs,
 * one column each, and the rows where they differ marked.
 */
export function InputsTable({ runs, unitSystem }: { runs: ReportRun[]; unitSystem: UnitSystem }) {
  const perRun = runs.map((run) => new Map(scenarioInputRows(run.scenario).map((row) => [row.path, row])));
  const paths = [...new Set(perRun.flatMap((m) => [...m.keys()]))].filter((p) => p !== 'name');
  const several = runs.length > 1;
  return (
    <div className="grid gap-x-8 gap-y-4 md:grid-cols-2 print:grid-cols-2" data-testid="report-inputs">
      {groups.map((group) => {
        const inGroup = paths.filter((p) => (group.prefix ? p.startsWith(group.prefix) : !p.includes('.')));
        if (inGroup.length === 0) return null;
        return (
          <div key={group.title} className={`keep-together ${several ? 'md:col-span-2 print:col-span-2' : ''}`}>
            <SubHeading>{group.title}</SubHeading>
            <ReportTable
              head={['Input', ...(several ? runs.map((r) => `Run ${r.id}`) : ['Value'])]}
              rows={inGroup.map((path) => {
                const values = perRun.map((m) => shown(m.get(path), unitSystem));
                const differs = several && new Set(values).size > 1;
                return {
                  key: path,
                  cells: [
                    <span className="text-xs">
                      {inputLabel(path)}
                      {differs && <span className="ml-1 rounded bg-mist px-1 text-[10px] text-ink">differs</span>}
                      <span className="num block break-all text-[10px] text-ink-soft">{path.slice(group.prefix.length)}</span>
                    </span>,
                    ...values.map((value) => <span className="whitespace-nowrap">{value}</span>),
                  ],
                };
              })}
            />
          </div>
        );
      })}
    </div>
  );
}
