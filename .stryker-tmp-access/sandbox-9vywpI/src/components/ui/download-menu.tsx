// @ts-nocheck
export interface DownloadLink {
  label: string;
  href: string;
  /** A short line under the label: what is in the file. */
  note?: string;
}

/**
 * A small menu of file downloads: plain links the server answers with an attachment, so the browser
 * saves the file under the name the server gives. Not printed.
 */
export function DownloadMenu({ links, label = 'Download' }: { links: DownloadLink[]; label?: string }) {
  return (
    <details
      className="relative print:hidden"
      data-testid="download-menu"
      // Escape closes the open menu and leaves the focus on its button, as a menu does.
      onKeyDown={(event) => {
        const menu = event.currentTarget;
        if (event.key !== 'Escape' || !menu.open) return;
        event.preventDefault();
        menu.open = false;
        menu.querySelector('summary')?.focus();
      }}
    >
      <summary className="cursor-pointer list-none rounded border border-rule bg-panel px-3 py-1.5 text-sm hover:bg-mist [&::-webkit-details-marker]:hidden">
        {label} <span aria-hidden>▾</span>
      </summary>
      <ul className="absolute right-0 z-20 mt-1 w-72 max-w-[calc(100vw-2rem)] rounded-md border border-rule bg-panel p-1 text-sm shadow-lg">
        {links.map((link) => (
          <li key={link.href}>
            <a
              href={link.href}
              download
              // The menu closes once a file is chosen.
              onClick={(event) => event.currentTarget.closest('details')?.removeAttribute('open')}
              className="block rounded px-3 py-1.5 hover:bg-mist focus-visible:bg-mist"
            >
              {link.label}
              {link.note && <span className="block text-xs text-ink-soft">{link.note}</span>}
            </a>
          </li>
        ))}
      </ul>
    </details>
  );
}

/** The downloads of one run: hourly results (SI, as the command line writes them) and the summary in the reader's units. */
export function runDownloadLinks(base: string, units: 'SI' | 'IP' = 'SI'): DownloadLink[] {
  const summaryQuery = units === 'IP' ? '?units=ip' : '';
  return [
    { label: 'Hourly results (CSV)', href: `${base}/hourly.csv`, note: 'one row per hour, the command line’s columns, SI' },
    { label: 'Hourly results (JSON)', href: `${base}/hourly.json`, note: 'the same columns, one array each, SI' },
    { label: 'Summary (CSV)', href: `${base}/summary.csv${summaryQuery}`, note: `every figure of the report, ${units}` },
    { label: 'Summary (JSON)', href: `${base}/summary.json${summaryQuery}`, note: `the report data and its figures, ${units}` },
  ];
}
