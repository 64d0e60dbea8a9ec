import { setPriority } from "node:os";

/**
 * How much nicer than the request threads a compute thread runs (Linux nice, 0–19). On Linux the
 * nice value belongs to each thread, and setpriority with pid 0 sets the calling one: a compute
 * thread yields the core to the web process's request threads, so a page or /api/health answers
 * while runs are computing. Raising niceness needs no privilege.
 */
export const COMPUTE_NICENESS = 10;

/** Called by the compute worker as it starts; where the call is refused it runs at normal priority. */
export function lowerOwnPriority(): void {
  try {
    setPriority(COMPUTE_NICENESS);
  } catch {
    // not permitted or not supported here: normal priority
  }
}
