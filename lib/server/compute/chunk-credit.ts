/**
 * Back-pressure between a run's compute thread and the response it feeds: a shared counter of
 * chunks the request thread is ready to take. The worker spends one per chunk it posts and,
 * with none left, sleeps on the counter (Atomics.wait, allowed in a worker thread) until the
 * response has been read further and the request thread adds one. So at most a few chunks of a
 * ~100 MB run wait in the request thread's memory, and a slow client slows the worker instead
 * of piling the output up in the web process. No `server-only`: the worker bundle imports it.
 */

/** Chunks the worker may post before the response has taken any. */
export const CHUNKS_AHEAD = 4;
/** How long one wait lasts before the worker looks again (a missed wake-up costs this much). */
const WAIT_MS = 1_000;

export type ChunkCredit = Int32Array;

export function newChunkCredit(ahead = CHUNKS_AHEAD): ChunkCredit {
  const credit = new Int32Array(new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT));
  credit[0] = ahead;
  return credit;
}

/** Request thread: the response took a chunk, the worker may post one more. */
export function grantChunk(credit: ChunkCredit): void {
  Atomics.add(credit, 0, 1);
  Atomics.notify(credit, 0);
}

/** Worker thread: blocks until one chunk may be posted, then spends it. */
export function takeChunk(credit: ChunkCredit): void {
  for (;;) {
    const now = Atomics.load(credit, 0);
    if (now > 0) {
      if (Atomics.compareExchange(credit, 0, now, now - 1) === now) return;
      continue;
    }
    Atomics.wait(credit, 0, now, WAIT_MS);
  }
}
