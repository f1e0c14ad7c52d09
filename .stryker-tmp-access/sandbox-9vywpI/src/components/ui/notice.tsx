// @ts-nocheck
import type { ReactNode } from 'react';

const tones = {
  info: 'border-harbour-soft/30 bg-mist text-ink',
  warn: 'border-signal-warn/40 bg-[#fbf3e4] text-ink',
  bad: 'border-signal-bad/40 bg-[#fbeceb] text-ink',
};

export function Notice({ tone = 'info', title, children }: { tone?: keyof typeof tones; title: string; children?: ReactNode }) {
  return (
    <div role={tone === 'bad' ? 'alert' : 'note'} className={`rounded-md border px-4 py-3 text-sm ${tones[tone]}`}>
      <p className="font-semibold">{title}</p>
      {children && <div className="mt-1 text-ink-soft">{children}</div>}
    </div>
  );
}
