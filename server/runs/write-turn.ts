/**
 * Turns at SQLite's write lock for the pool threads that store runs. SQLite lets one connection write at a time and
 * makes the others wait by sleeping and retrying (busy_timeout, in steps of 1, 2, 5, 10 ms…), so two threads storing
 * a sweep's points at once lose several milliseconds per collision to sleeps that outlast the write they wait for.
 * A thread that takes its turn here instead waits on shared memory and is woken the moment the other thread's write
 * ends. SQLite's lock stays the guard of correctness: the turn only orders the threads, and the main thread (which
 * writes little: statuses and the audit trail) does not take turns.
 */

/** A fresh turn, shared by every thread it is posted to (an Int32Array over a SharedArrayBuffer). */
export function createWriteTurn(): Int32Array {
  return new Int32Array(new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT));
}

const FREE = 0;
const HELD = 1;

/**
 * Runs `write` in this thread's turn. A turn held longer than `maxWaitMs` (its thread was stopped mid-write: a
 * cancel or a time limit ends a thread without releasing it) is taken over, so a lost turn delays the next write once
 * and never blocks it. Without a turn (a caller that writes alone) it simply writes.
 */
export function withWriteTurn<T>(turn: Int32Array | undefined, write: () => T, maxWaitMs = 2_000): T {
  if (!turn) return write();
  const deadline = performance.now() + maxWaitMs;
  while (Atomics.compareExchange(turn, 0, FREE, HELD) !== FREE) {
    const leftMs = deadline - performance.now();
    if (leftMs <= 0) {
      Atomics.store(turn, 0, HELD);
      break;
    }
    Atomics.wait(turn, 0, HELD, leftMs);
  }
  try {
    return write();
  } finally {
    Atomics.store(turn, 0, FREE);
    Atomics.notify(turn, 0, 1);
  }
}
