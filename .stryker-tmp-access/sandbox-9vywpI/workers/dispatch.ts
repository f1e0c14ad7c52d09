/**
 * What every pool thread runs: the task named in the message, from workers/tasks.ts. The pool loads this
 * file as a bundle (workers/fresh-bundle.mjs), so threads run plain JavaScript.
 */
// @ts-nocheck

import * as tasks from './tasks';

export default function dispatch({ task, input }: { task: string; input: unknown }): unknown {
  const run = (tasks as Record<string, unknown>)[task];
  if (typeof run !== 'function') throw new RangeError(`Unknown worker task "${task}".`);
  return (run as (input: unknown) => unknown)(input);
}
