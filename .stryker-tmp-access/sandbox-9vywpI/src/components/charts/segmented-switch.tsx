/** A small row of toggle buttons for a chart option (projection, units); keyboard reachable, state announced. */
// @ts-nocheck

export function SegmentedSwitch<T extends string>({
  label,
  options,
  value,
  onChange,
}: {
  label: string;
  options: ReadonlyArray<{ value: T; label: string }>;
  value: T;
  onChange: (next: T) => void;
}) {
  return (
    <div role="group" aria-label={label} className="inline-flex overflow-hidden rounded border border-rule text-xs">
      {options.map((option) => (
        <button
          key={option.value}
          type="button"
          aria-pressed={option.value === value}
          onClick={() => onChange(option.value)}
          className={`px-2.5 py-1 ${option.value === value ? 'bg-harbour text-paper' : 'bg-panel text-ink-soft hover:bg-mist'}`}
        >
          {option.label}
        </button>
      ))}
    </div>
  );
}
