// @ts-nocheck
import type { ReactNode } from 'react';

/** One option of a radio choice drawn as a card: the radio input (passed in), its name and a line of help. */
export function ChoiceCard({
  selected,
  label,
  help,
  children,
  compact = false,
}: {
  selected: boolean;
  label: string;
  help: string;
  children: ReactNode;
  compact?: boolean;
}) {
  return (
    <label
      className={`flex cursor-pointer gap-2 rounded border px-3 text-sm has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-harbour-soft ${compact ? 'py-1.5' : 'py-2'} ${
        selected ? 'border-harbour bg-mist' : 'border-rule'
      }`}
    >
      {children}
      <span>
        <span className="font-medium">{label}</span>
        <span className="block text-xs text-ink-soft">{help}</span>
      </span>
    </label>
  );
}
