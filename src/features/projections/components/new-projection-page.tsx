/** Placeholder until the page lands. */
export function NewProjectionPage() {
  return <p className="text-sm text-ink-soft">This page is being built.</p>;
}
