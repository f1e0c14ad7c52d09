// @ts-nocheck
import type { ReactNode } from 'react';
import './report-print.css';

/** The report as a document: a sheet of paper on screen, the page itself in print. */
export function ReportSheet({ children }: { children: ReactNode }) {
  return (
    <article className="report-document mx-auto max-w-[62rem] space-y-8 rounded-md border border-rule bg-panel px-10 py-8 print:max-w-none print:rounded-none print:border-0 print:p-0">
      {children}
    </article>
  );
}

/** One numbered part of the report; `newPage` starts it on a fresh page in print. */
export function ReportSection({ id, title, newPage = false, children }: { id: string; title: string; newPage?: boolean; children: ReactNode }) {
  return (
    <section aria-labelledby={`${id}-title`} className={`report-section space-y-3 ${newPage ? 'print:break-before-page' : ''}`}>
      <h2 id={`${id}-title`} className="border-b border-harbour/40 pb-1 text-base font-semibold text-harbour">
        {title}
      </h2>
      {children}
    </section>
  );
}

export function SubHeading({ children }: { children: ReactNode }) {
  return <h3 className="pt-1 text-sm font-semibold text-ink">{children}</h3>;
}

/** Label–value pairs in two columns; values in the monospace face where they are figures. */
export function Facts({ items, testId }: { items: Array<[string, ReactNode]>; testId?: string }) {
  return (
    <dl className="grid grid-cols-[minmax(10rem,auto)_1fr] gap-x-6 gap-y-1 text-sm" data-testid={testId}>
      {items.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="text-ink-soft">{label}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/**
 * A figure-dense table that prints without splitting a row across pages: figures right-aligned and kept
 * on one line; `text` for a table of words (left-aligned, wrapping).
 */
export function ReportTable({
  caption,
  head,
  rows,
  testId,
  text = false,
}: {
  caption?: string;
  head: ReactNode[];
  rows: Array<{ key: string; cells: ReactNode[]; strong?: boolean }>;
  testId?: string;
  text?: boolean;
}) {
  const cellStyle = text ? 'px-2 py-0.5 text-left align-top' : 'num whitespace-nowrap px-2 py-0.5 text-right';
  return (
    <table className="w-full text-sm" data-testid={testId}>
      {caption && <caption className="pb-1 text-left text-xs text-ink-soft">{caption}</caption>}
      <thead>
        <tr className="border-b border-rule text-xs text-ink-soft">
          {head.map((h, i) => (
            <th key={i} scope="col" className={`px-2 py-1 font-medium ${i === 0 ? 'pl-0 text-left' : text ? 'text-left' : 'text-right'}`}>
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.key} className={`border-b border-rule/60 ${row.strong ? 'font-medium' : ''}`}>
            {row.cells.map((cell, i) =>
              i === 0 ? (
                <th key={i} scope="row" className={`py-0.5 pl-0 pr-2 text-left align-top ${row.strong ? 'font-medium' : 'font-normal'}`}>
                  {cell}
                </th>
              ) : (
                <td key={i} className={cellStyle}>
                  {cell}
                </td>
              ),
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
