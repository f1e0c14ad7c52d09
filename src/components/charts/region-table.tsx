import { REGION_KEYS, type RegionKey } from '../../../shared/scenario/operating-regions';
import { regionNames, regionTintCss } from '../../lib/charts/region-words';

export interface RegionTableProps {
  /** Each region's rule in words, null where the design has no such region. */
  rules: Record<RegionKey, string | null>;
  /** Hours per region in REGION_KEYS order, or null while they are counted. */
  hours: ArrayLike<number> | null;
  /** Hours the shares are taken of (every hour with data). */
  totalHours: number;
  /** 'modes': the hours as the run classified them; 'grid': each hour counted in the region of its grid cell. */
  countedBy: 'modes' | 'grid';
}

/** The design's operating regions with their rules and the hours in each: the text beside the moist-air chart. */
export function RegionTable({ rules, hours, totalHours, countedBy }: RegionTableProps) {
  const keys = REGION_KEYS.filter((k) => rules[k] !== null || (hours && hours[REGION_KEYS.indexOf(k)] > 0));
  return (
    <table className="w-full text-sm" data-testid="region-table">
      <caption className="pb-1 text-left text-xs text-ink-soft">
        Operating regions of the design and the hours in each
        {countedBy === 'grid' ? ', counted by the region each hour falls in at the site’s pressure' : ', as the run classified them'}
      </caption>
      <thead>
        <tr className="border-b border-rule text-xs text-ink-soft">
          <th scope="col" className="py-1 text-left font-medium">
            Region
          </th>
          <th scope="col" className="px-1 py-1 text-right font-medium">
            Hours
          </th>
          <th scope="col" className="py-1 pl-1 text-right font-medium">
            Share
          </th>
        </tr>
      </thead>
      <tbody>
        {keys.map((key) => {
          const n = hours ? hours[REGION_KEYS.indexOf(key)] : null;
          return (
            <tr key={key} className="border-b border-rule/60 align-top" data-region={key}>
              <th scope="row" className="py-1 pr-2 text-left font-normal">
                <span className="flex items-center gap-1.5 font-medium">
                  <span aria-hidden className="inline-block size-3 shrink-0 rounded-sm border border-rule" style={{ background: regionTintCss(key) }} />
                  {regionNames[key]}
                </span>
                {rules[key] && <span className="mt-0.5 block text-xs text-ink-soft">{rules[key]}</span>}
              </th>
              <td className="num whitespace-nowrap px-1 py-1 text-right">{n === null ? '…' : `${n.toLocaleString('en')} h`}</td>
              <td className="num whitespace-nowrap py-1 pl-1 text-right text-ink-soft">
                {n === null ? '' : totalHours ? `${((100 * n) / totalHours).toFixed(1)} %` : '–'}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
