// @ts-nocheck
import { Link } from 'react-router-dom';
import { SegmentedSwitch } from '@/components/charts/segmented-switch';
import { DownloadMenu, type DownloadLink } from '@/components/ui/download-menu';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';

const unitOptions = [
  { value: 'SI', label: 'SI' },
  { value: 'IP', label: 'IP' },
] as const satisfies ReadonlyArray<{ value: UnitSystem; label: string }>;

/** Controls above a report: back, units, downloads, share (owners), print. None of it is printed. */
export function ReportToolbar({
  back,
  downloads,
  share,
}: {
  back?: { to: string; label: string };
  downloads: DownloadLink[];
  share?: { open: boolean; toggle: () => void };
}) {
  const { unitSystem, setUnitSystem, local } = useUnitSystem();
  return (
    <div className="mx-auto mb-4 flex max-w-[62rem] flex-wrap items-center gap-2 text-sm print:hidden" data-testid="report-toolbar">
      {back && (
        <Link to={back.to} className="mr-auto text-ink-soft underline hover:decoration-2">
          ← {back.label}
        </Link>
      )}
      <SegmentedSwitch<UnitSystem> label={local ? 'Units of this report' : 'Units'} options={unitOptions} value={unitSystem} onChange={setUnitSystem} />
      {local && <span className="text-xs text-ink-soft">(this report only; your setting stays)</span>}
      <DownloadMenu links={downloads} />
      {share && (
        <button type="button" aria-expanded={share.open} onClick={share.toggle} className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist">
          Share
        </button>
      )}
      <button type="button" onClick={() => window.print()} className="rounded bg-harbour px-3 py-1.5 text-paper hover:bg-harbour-soft">
        Print or save as PDF
      </button>
    </div>
  );
}
