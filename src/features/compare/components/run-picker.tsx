import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { SortHeader } from '@/components/ui/sort-header';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { sweepPointParts } from '@/lib/sweep-value';
import { useUnitSystem } from '@/lib/unit-system';
import type { RunListing } from '@/lib/api/runs';
import { defaultPickerView, pickerViewOptions, runsInView, type PickerView } from '../lib/run-picker-view';
import { ENGINE_VERSION } from '../../../../shared/scenario/version';

const column = createColumnHelper<RunListing>();
const share = (r: RunListing, key: 'free' | 'mechanical') => (r.results ? r.results.hours[key] / Math.max(1, r.results.hours.total) : 0);

/**
 * Finished runs, sortable by their headline figures, each with a tick to compare and a choice of baseline. Sweep
 * points are hidden at first (a sweep may hold 200) and can be listed, all or one sweep's, each labelled with its
 * sweep and swept value.
 */
export function RunPicker({
  projectId,
  runs,
  chosen,
  baselineId,
  onToggle,
  onBaseline,
}: {
  projectId: number;
  runs: RunListing[];
  chosen: number[];
  baselineId: number;
  onToggle: (id: number) => void;
  onBaseline: (id: number) => void;
}) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'id', desc: true }]);
  const { unitSystem } = useUnitSystem();
  const options = useMemo(() => pickerViewOptions(runs), [runs]);
  const [viewChoice, setView] = useState<PickerView | null>(null);
  // A sweep deleted meanwhile, or no choice made yet: the default view.
  const view =
    viewChoice && (viewChoice === 'plain' || viewChoice === 'all' || options.some((o) => o.value === viewChoice)) ? viewChoice : defaultPickerView(runs);
  const listed = useMemo(() => runsInView(runs, view, chosen), [runs, view, chosen]);
  const columns = useMemo(
    () => [
      column.display({
        id: 'pick',
        header: 'Compare',
        cell: ({ row }) => (
          <input
            type="checkbox"
            className="accent-harbour"
            aria-label={`Compare run ${row.original.id}`}
            checked={chosen.includes(row.original.id)}
            onChange={() => onToggle(row.original.id)}
          />
        ),
      }),
      column.accessor('id', {
        header: 'Run',
        cell: ({ row }) => {
          const r = row.original;
          const place = (
            <span className="block text-xs text-ink-soft">
              {r.climate.site.name} · {r.climate.name}
              {/* A run by an older engine is marked, so like can be compared with like. */}
              {r.engineVersion !== ENGINE_VERSION && (
                <span className="text-signal-warn" data-testid="older-engine">
                  {' '}
                  · by {r.engineVersion}
                </span>
              )}
            </span>
          );
          // A sweep point is named by its swept value in the reader's units; its scenario name repeats the base and gives the value in SI.
          if (r.sweepId !== null && r.sweepPoint) {
            return (
              <Link to={`/projects/${projectId}/runs/${r.id}`} className="underline hover:decoration-2" title={r.scenario.name}>
                <span className="num text-xs text-ink-faint">#{r.id}</span>{' '}
                <span data-testid="sweep-point-value">
                  {sweepPointParts(r.sweepPoint, unitSystem).map((part, i) => (
                    <span key={part.path}>
                      {i > 0 && ' · '}
                      {part.short} <span className="num whitespace-nowrap">{part.value}</span>
                    </span>
                  ))}
                </span>
                <span className="block text-xs text-harbour-soft" data-testid="sweep-point-sweep">
                  Point of sweep {r.sweepName ?? r.sweepId}
                </span>
                {place}
              </Link>
            );
          }
          return (
            <Link to={`/projects/${projectId}/runs/${r.id}`} className="underline hover:decoration-2">
              <span className="num text-xs text-ink-faint">#{r.id}</span> {r.scenario.name}
              {place}
            </Link>
          );
        },
      }),
      column.accessor((r) => share(r, 'free'), {
        id: 'free',
        header: 'Free',
        cell: (c) => <span className="num whitespace-nowrap">{(100 * c.getValue()).toFixed(0)} %</span>,
      }),
      column.accessor((r) => r.results?.energy.partialPue ?? Number.POSITIVE_INFINITY, {
        id: 'ppue',
        header: 'pPUE',
        cell: (c) => <span className="num">{Number.isFinite(c.getValue()) ? c.getValue().toFixed(3) : '–'}</span>,
      }),
      column.display({
        id: 'baseline',
        header: 'Baseline',
        cell: ({ row }) => (
          <input
            type="radio"
            name="baseline"
            className="accent-harbour"
            aria-label={`Run ${row.original.id} as baseline`}
            disabled={!chosen.includes(row.original.id)}
            checked={row.original.id === baselineId}
            onChange={() => onBaseline(row.original.id)}
          />
        ),
      }),
    ],
    [projectId, chosen, baselineId, onToggle, onBaseline, unitSystem],
  );
  const table = useReactTable({
    data: listed,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  return (
    <div className="space-y-2">
      {options.length > 0 && (
        <label className="block text-xs text-ink-soft">
          Runs listed
          <select
            className="mt-1 block w-full min-w-0 rounded border border-rule bg-panel px-1.5 py-1 text-sm text-ink"
            value={view}
            onChange={(e) => {
              const next = e.target.value as PickerView;
              setView(next);
              // One sweep's points read best in sweep order (its runs were made in that order).
              if (next.startsWith('sweep-')) setSorting([{ id: 'id', desc: false }]);
            }}
            data-testid="run-picker-view"
          >
            {options.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label} ({o.count})
              </option>
            ))}
          </select>
        </label>
      )}
      {/* Long run names wrap; the scroll is a last resort on a narrow screen, so the baseline column is never cut off. */}
      <div className="overflow-x-auto">
        <table className="w-full text-sm" data-testid="run-picker">
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="border-b border-rule text-xs text-ink-soft">
                {group.headers.map((header) => (
                  <SortHeader key={header.id} header={header} className={`px-1 py-1 font-medium ${header.id === 'id' ? 'text-left' : 'text-center'}`} />
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className={`border-b border-rule/60 align-top ${row.original.sweepId !== null ? 'bg-paper/60' : ''}`}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className={`px-1 py-1 ${cell.column.id === 'id' ? 'text-left [overflow-wrap:anywhere]' : 'text-center'}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
