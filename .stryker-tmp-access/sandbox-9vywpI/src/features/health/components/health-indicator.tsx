// @ts-nocheck
import { useHealth } from '../api/get-health';

/** A small lamp in the header: is the server up and its database answering? */
export function HealthIndicator() {
  const health = useHealth();
  const state = health.isPending ? 'checking' : health.isError ? 'down' : 'up';
  const label = {
    checking: 'Checking server…',
    down: 'Server unreachable',
    up: `Server up · db ${health.data?.database.latencyMs.toFixed(1)} ms`,
  }[state];
  const lamp = { checking: 'bg-ink-faint', down: 'bg-signal-bad', up: 'bg-signal-ok' }[state];
  return (
    <p role="status" aria-live="polite" data-testid="health" data-state={state} className="flex items-center gap-2 text-xs text-mist/90">
      <span aria-hidden className={`inline-block size-2 rounded-full ${lamp}`} />
      <span className="num">{label}</span>
    </p>
  );
}
