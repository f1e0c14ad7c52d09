import { useMemo } from 'react';
import { formatQuantity, unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { csvRow } from '../../../../shared/csv';
import { modeColours, modeKeys, modeLabels } from '../../../../shared/modes';
import { dryBulbBins } from '../utils/bin-table';

function download(name: string, text: string) {
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv' }));
  const a = Object.assign(document.createElement('a'), { href: url, download: name });
  a.click();
  URL.revokeObjectURL(url);
}

/** 2 K dry-bulb bins × hours per mode, with the mean coincident wet-bulb; downloadable as CSV. */
export function BinTablePanel({
  modes,
  dryBulbC,
  wetBulbC,
  fileStem,
}: {
  modes: ArrayLike<number>;
  dryBulbC: ArrayLike<number>;
  wetBulbC: ArrayLike<number>;
  fileStem: string;
}) {
  const { unitSystem } = useUnitSystem();
  const table = useMemo(() => dryBulbBins(modes, dryBulbC, wetBulbC, 2), [modes, dryBulbC, wetBulbC]);
  const tUnit = unitOf('temperature', unitSystem);
  const edge = (c: number) => formatQuantity('temperature', unitSystem, c, false);

  function csv() {
    const header = [`dry_bulb_from_${unitSystem === 'SI' ? 'c' : 'f'}`, `dry_bulb_to_${unitSystem === 'SI' ? 'c' : 'f'}`, ...modeKeys.map((k) => `${k}_h`), 'total_h', `mean_wet_bulb_${unitSystem === 'SI' ? 'c' : 'f'}`];
    const lines = [csvRow(header)];
    for (const b of table.bins) {
      lines.push(csvRow([edge(b.fromC), edge(b.toC), ...b.hours, b.total, Number.isFinite(b.meanWetBulbC) ? formatQuantity('temperature', unitSystem, b.meanWetBulbC, false) : '']));
    }
    download(`${fileStem}-bins.csv`, `${lines.join('\n')}\n`);
  }

  return (
    <div>
      <div className="mb-2 flex items-center justify-between">
        <p className="text-xs text-ink-soft">
          Bins of 2 K ({unitSystem === 'IP' ? '3.6 °F' : '2 °C'}) of outdoor dry-bulb, warmest first.
          {table.hoursWithoutDryBulb > 0 && ` ${table.hoursWithoutDryBulb.toLocaleString('en')} hours without a dry-bulb are left out.`}
        </p>
        <button type="button" onClick={csv} className="rounded border border-rule px-3 py-1 text-xs hover:bg-mist">
          Download CSV
        </button>
      </div>
      <div className="max-h-[28rem] overflow-auto">
        <table className="num w-full text-right text-xs" data-testid="bin-table">
          <thead className="sticky top-0 bg-panel">
            <tr className="border-b border-rule text-ink-soft">
              <th scope="col" className="py-1 text-left font-sans font-medium">Dry-bulb ({tUnit})</th>
              {modeKeys.map((k) => (
                <th key={k} scope="col" className="px-2 py-1 font-sans font-medium">
                  <span className="mr-1 inline-block size-2.5 rounded-sm" style={{ background: modeColours[k] }} aria-hidden />
                  {modeLabels[k]}
                </th>
              ))}
              <th scope="col" className="px-2 py-1 font-sans font-medium">All (h)</th>
              <th scope="col" className="px-2 py-1 font-sans font-medium">Mean coincident wet-bulb ({tUnit})</th>
            </tr>
          </thead>
          <tbody>
            {table.bins.map((b) => (
              <tr key={b.fromC} className="border-b border-rule/60 hover:bg-mist/50">
                <th scope="row" className="py-0.5 text-left font-normal">
                  {edge(b.fromC)} to {edge(b.toC)}
                </th>
                {b.hours.map((h, i) => (
                  <td key={i} className={`px-2 py-0.5 ${h === 0 ? 'text-ink-faint' : ''}`}>
                    {h.toLocaleString('en')}
                  </td>
                ))}
                <td className="px-2 py-0.5 font-semibold">{b.total.toLocaleString('en')}</td>
                <td className="px-2 py-0.5">{Number.isFinite(b.meanWetBulbC) ? formatQuantity('temperature', unitSystem, b.meanWetBulbC, false) : '–'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
