// @ts-nocheck
import { useMemo, useState } from 'react';
import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { SortHeader } from '@/components/ui/sort-header';
import { downloadCsv } from '@/lib/download';
import { formatCount, formatQuantity, unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { csvRow } from '../../../../shared/csv';
import { ModeSwatch } from '@/components/ui/mode-marks';
import { modeKeys, modeLabels } from '../../../../shared/modes';
import { DRY_BULB_BIN_GRIDS, type BinTable, type DryBulbBin } from '../../../../shared/report/dry-bulb-bins';
import { useRunDryBulbBins } from '../api/get-run-hour-columns';

const column = createColumnHelper<DryBulbBin>();
const noBins: DryBulbBin[] = [];

/**
 * Dry-bulb bins × hours per mode, with the mean coincident wet-bulb (made on the server); sortable by any column,
 * downloadable as CSV. Bins are chosen for the unit, not converted: the page's 2 K bins in SI, 5 °F bins on a 0 °F grid
 * in IP (whole-degree edges), asked for when IP is chosen.
 */
export function BinTablePanel({ siTable, projectId, runId, fileStem }: { siTable: BinTable; projectId: number; runId: number; fileStem: string }) {
  const { unitSystem } = useUnitSystem();
  const grid = DRY_BULB_BIN_GRIDS[unitSystem];
  const ipTable = useRunDryBulbBins(projectId, runId, DRY_BULB_BIN_GRIDS.IP, unitSystem === 'IP');
  const table = unitSystem === 'IP' ? ipTable.data : siTable;
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
          cell: (c) => <span className={c.getValue() === 0 ? 'text-ink-faint' : ''}>{formatCount(c.getValue())}</span>,
        }),
      ),
      column.accessor('total', { header: 'All (h)', cell: (c) => <span className="font-semibold">{formatCount(c.getValue())}</span> }),
      column.accessor((b) => (Number.isFinite(b.meanWetBulbC) ? b.meanWetBulbC : -Infinity), {
        id: 'meanWetBulbC',
        header: `Mean coincident wet-bulb (${tUnit})`,
        cell: ({ row }) => formatQuantity('temperature', unitSystem, row.original.meanWetBulbC, false),
      }),
    ];
  }, [unitSystem, tUnit]);
  const view = useReactTable({
    data: table?.bins ?? noBins,
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
      lines.push(
        csvRow([
          edge(b.fromC),
          edge(b.toC),
          ...b.hours,
          b.total,
          Number.isFinite(b.meanWetBulbC) ? formatQuantity('temperature', unitSystem, b.meanWetBulbC, false) : '',
        ]),
      );
    }
    downloadCsv(`${fileStem}-bins.csv`, `${lines.join('\n')}\n`);
  }

  return (
    <div>
      <div className="mb-2 flex items-center justify-between">
        <p className="text-xs text-ink-soft">
          Bins of {grid.label} of outdoor dry-bulb, warmest first; choose a heading to sort by it.
          {table && table.hoursWithoutDryBulb > 0 && ` ${formatCount(table.hoursWithoutDryBulb)} hours without a dry-bulb are left out.`}
        </p>
        <button type="button" onClick={csv} className="rounded border border-rule px-3 py-1 text-xs hover:bg-mist">
          Download CSV
        </button>
      </div>
      {unitSystem === 'IP' && ipTable.isPending && <p className="text-xs text-ink-soft">Loading the 5 °F bins…</p>}
      {unitSystem === 'IP' && ipTable.isError && (
        <p role="alert" className="text-xs text-signal-bad">
          The 5 °F bins could not be loaded: {ipTable.error.message}
        </p>
      )}
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
