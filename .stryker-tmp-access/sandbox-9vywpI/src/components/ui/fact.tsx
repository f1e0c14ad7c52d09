/** One headline figure in a bordered tile: a label, the value in the number face, an optional note. Use inside a <dl>. */
// @ts-nocheck

export function Fact({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div className="rounded-md border border-rule bg-panel px-4 py-3">
      <dt className="text-xs text-ink-soft">{label}</dt>
      <dd className="num mt-0.5 text-lg font-semibold">{value}</dd>
      {note && <dd className="text-xs text-ink-soft">{note}</dd>}
    </div>
  );
}
