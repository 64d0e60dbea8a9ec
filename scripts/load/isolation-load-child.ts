/**
 * bench:isolation's heavy clients as a child process (started by scripts/bench-isolation.ts with
 * `--import tsx`): lowers the priority of every one of its threads to nice 10 first, says it is
 * ready, then takes the load's settings from the parent, runs it and sends back what it counted.
 */
import { readdirSync } from "node:fs";
import os from "node:os";

import { runHeavyLoad, type HeavyLoad } from "./isolation-load";

/** Nicer than the server under test and the health pollers (both at 0). */
const CLIENT_NICENESS = 10;

/**
 * Linux keeps a nice value per thread and a new thread takes its creator's: every thread that
 * exists now (the main one, V8's and libuv's) is lowered, and later ones inherit it.
 */
function lowerEveryThread(): void {
  let tids: number[] = [0];
  try {
    tids = readdirSync("/proc/self/task").map(Number);
  } catch {}
  for (const tid of tids) {
    try {
      os.setPriority(tid, CLIENT_NICENESS);
    } catch {}
  }
}

lowerEveryThread();
process.send!("ready");
process.once("message", (load: HeavyLoad) => {
  runHeavyLoad(load).then(
    (result) => process.send!(result, () => process.exit(0)),
    (error: unknown) => {
      console.error("heavy clients failed:", error instanceof Error ? error.message : error);
      process.exit(1);
    },
  );
});
