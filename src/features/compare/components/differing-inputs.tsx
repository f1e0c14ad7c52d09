import { formatInputValue } from '@/lib/input-value';
import { useUnitSystem } from '@/lib/unit-system';
import { differingInputs } from '../../../../shared/report/inputs';
import { inputLabel } from '../../../../shared/scenario/input-labels';
import type { RunListing } from '@/lib/api/runs';

/**
 * What differs between the compared runs: the climate file and site, then every scenario input whose value is not
 * the same in all of them, by its plain name, one column per run (as the comparison report marks them).
 */
export function DifferingInputs({ runs, scenarios }: { runs: RunListing[]; scenarios: (unknown | undefined)[] }) {
  const { unitSystem } = useUnitSystem();
  if (scenarios.some((s) => s === undefined))
    return <div role="progressbar" className="h-24 animate-pulse rounded bg-mist" aria-label="Loading the runs' inputs" />;
  const inputs = differingInputs(scenarios);
  const files = runs.map((r) => `${r.climate.site.name} · ${r.climate.name}`);
  const fileDiffers = new Set(files).size > 1;
  if (inputs.length === 0 && !fileDiffers)
    return (
      <p className="text-sm text-ink-soft" data-testid="differing-inputs">
        The runs have the same inputs and climate file.
      </p>
    );
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" data-testid="differing-inputs">
        <thead>
          <tr className="border-b border-rule text-left text-xs text-ink-soft">
            <th scope="col" className="py-1 font-medium">
              Input
            </th>
            {runs.map((r) => (
              <th key={r.id} scope="col" className="px-2 py-1 font-medium">
                Run {r.id}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {fileDiffers && (
            <tr className="border-b border-rule/60">
              <th scope="row" className="py-1 text-left font-normal">
                Climate file
              </th>
              {files.map((f, i) => (
                <td key={runs[i].id} className="px-2 py-1">
                  {f}
                </td>
              ))}
            </tr>
          )}
          {inputs.map((input) => (
            <tr key={input.path} className="border-b border-rule/60">
              <th scope="row" className="py-1 text-left font-normal">
                {inputLabel(input.path)}
                <span className="block font-mono text-[11px] text-ink-faint">{input.path}</span>
              </th>
              {input.rows.map((row, i) => (
                <td key={runs[i].id} className="num px-2 py-1">
                  {row ? formatInputValue(row, unitSystem) : '–'}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
