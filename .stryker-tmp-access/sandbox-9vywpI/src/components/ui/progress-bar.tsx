/** A determinate progress bar (0–100 %) with its accessible name; `animate` eases the width between updates. */
// @ts-nocheck

export function ProgressBar({ label, percent, animate = true }: { label: string; percent: number; animate?: boolean }) {
  const pct = Math.max(0, Math.min(100, Math.round(percent)));
  return (
    <div
      className="mt-3 h-2 overflow-hidden rounded-full bg-mist"
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={pct}
    >
      <div className={`h-full bg-harbour ${animate ? 'transition-[width] duration-500' : ''}`} style={{ width: `${pct}%` }} />
    </div>
  );
}
