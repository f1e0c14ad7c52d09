import { useMemo, useState } from 'react';
import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { SortHeader } from '@/components/ui/sort-header';
import { downloadCsv } from '@/lib/download';
import { formatQuantity, unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { csvRow } from '../../../../shared/csv';
import { ModeSwatch } from '@/components/ui/mode-marks';
import { modeKeys, modeLabels } from '../../../../shared/modes';
import { dryBulbBins, type DryBulbBin } from '../utils/bin-table';

const column = createColumnHelper<DryBulbBin>();

const SI_BINS = { widthK: 2, originC: 0, label: '2 K' };
// 5 °F bins from 0 °F: 5 °F = 5/1.8 K; 0 °F = (0 − 32)/1.8 °C (NIST SP 811, exact).
const IP_BINS = { widthK: 5 / 1.8, originC: -32 / 1.8, label: '5 °F' };

/** 2 K (SI) or 5 °F (IP) dry-bulb bins × hours per mode, with the mean coincident wet-bulb; sortable by any column, downloadable as CSV. */
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
  // Bins are chosen for the unit, not converted: 2 K in SI, 5 °F on a 0 °F grid in IP (whole-degree edges).
  const grid = unitSystem === 'IP' ? IP_BINS : SI_BINS;
  const table = useMemo(() => dryBulbBins(modes, dryBulbC, wetBulbC, grid.widthK, grid.originC), [modes, dryBulbC, wetBulbC, grid]);
  const tUnit = unitOf('temperature', unitSystem);
  const [sorting, setSorting] = useState<SortingState>([]);
  const columns = useMemo(() => {
    const edge = (c: number) => formatQuantity('temperature', unitSystem, c, false);
    return [
      column.accessor('fromC', {
        header: `Dry-bulb (${tUnit})`,
        cell: ({ row }) => `${edge(row.original.fromC)} to ${edge(row.original.toC)}`,
      }),
      ...modeKeys.map((k, i) =>
        column.accessor((b) => b.hours[i], {
          id: k,
          header: () => (
            <>
              <ModeSwatch mode={k} className="mr-1 size-2.5" />
              {modeLabels[k]}
            </>
          ),
          cell: (c) => <span className={c.getValue() === 0 ? 'text-ink-faint' : ''}>{c.getValue().toLocaleString('en')}</span>,
        }),
      ),
      column.accessor('total', { header: 'All (h)', cell: (c) => <span className="font-semibold">{c.getValue().toLocaleString('en')}</span> }),
      column.accessor((b) => (Number.isFinite(b.meanWetBulbC) ? b.meanWetBulbC : -Infinity), {
        id: 'meanWetBulbC',
        header: `Mean coincident wet-bulb (${tUnit})`,
        cell: ({ row }) => formatQuantity('temperature', unitSystem, row.original.meanWetBulbC, false),
      }),
    ];
  }, [unitSystem, tUnit]);
  const view = useReactTable({
    data: table.bins,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  function csv() {
    const edge = (c: number) => formatQuantity('temperature', unitSystem, c, false);
    const suffix = unitSystem === 'SI' ? 'c' : 'f';
    const header = [`dry_bulb_from_${suffix}`, `dry_bulb_to_${suffix}`, ...modeKeys.map((k) => `${k}_h`), 'total_h', `mean_wet_bulb_${suffix}`];
    const lines = [csvRow(header)];
    for (const { original: b } of view.getRowModel().rows) {
      lines.push(csvRow([edge(b.fromC), edge(b.toC), ...b.hours, b.total, Number.isFinite(b.meanWetBulbC) ? formatQuantity('temperature', unitSystem, b.meanWetBulbC, false) : '']));
    }
    downloadCsv(`${fileStem}-bins.csv`, `${lines.join('\n')}\n`);
  }

  return (
    <div>
      <div className="mb-2 flex items-center justify-between">
        <p className="text-xs text-ink-soft">
          Bins of {grid.label} of outdoor dry-bulb, warmest first; choose a heading to sort by it.
          {table.hoursWithoutDryBulb > 0 && ` ${table.hoursWithoutDryBulb.toLocaleString('en')} hours without a dry-bulb are left out.`}
        </p>
        <button type="button" onClick={csv} className="rounded border border-rule px-3 py-1 text-xs hover:bg-mist">
          Download CSV
        </button>
      </div>
      <div className="max-h-[28rem] overflow-auto">
        <table className="num w-full text-right text-xs" data-testid="bin-table">
          <thead className="sticky top-0 bg-panel">
            {view.getHeaderGroups().map((group) => (
              <tr key={group.id} className="border-b border-rule text-ink-soft">
                {group.headers.map((header) => (
                  <SortHeader key={header.id} header={header} className={`px-2 py-1 font-sans font-medium ${header.id === 'fromC' ? 'text-left' : ''}`} />
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {view.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-rule/60 hover:bg-mist/50">
                {row.getVisibleCells().map((cell) =>
                  cell.column.id === 'fromC' ? (
                    <th key={cell.id} scope="row" className="py-0.5 text-left font-normal">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </th>
                  ) : (
                    <td key={cell.id} className="px-2 py-0.5">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ),
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
