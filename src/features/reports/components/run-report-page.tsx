/** Placeholder until the page lands. */
export function RunReportPage() {
  return <p className="text-sm text-ink-soft">This page is being built.</p>;
}
