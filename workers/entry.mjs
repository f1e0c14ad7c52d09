// The file every pool thread loads. It registers tsx's loader inside the thread, then loads the
// TypeScript task module, so tasks run from source the same way in development, tests and production.
// (Node 20 does not carry a parent's --import loader into piscina's worker threads.)
import { register } from 'tsx/esm/api';

register();
const tasks = await import('./tasks.ts');

/** @param {{ task: string, input: unknown }} message */
export default function dispatch({ task, input }) {
  const run = tasks[task];
  if (typeof run !== 'function') throw new RangeError(`Unknown worker task "${task}".`);
  return run(input);
}
