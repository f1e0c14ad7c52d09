// @ts-nocheck
import type { ReactNode } from 'react';

export function Panel({ title, children, actions }: { title?: string; children: ReactNode; actions?: ReactNode }) {
  return (
    <section className="rounded-md border border-rule bg-panel">
      {title && (
        <header className="flex items-center justify-between border-b border-rule px-4 py-2.5">
          <h2 className="text-sm font-semibold text-ink">{title}</h2>
          {actions}
        </header>
      )}
      <div className="p-4">{children}</div>
    </section>
  );
}
