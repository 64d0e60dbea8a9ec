/**
 * Isolation (issue 11): a compute thread lowers its own priority as it starts (Linux nice 10,
 * a per-thread value), so the request threads of the same process win the core. Read back from
 * /proc after a task: some thread of this process runs at nice 10, none of the others changed.
 */
import { readdirSync, readFileSync } from "node:fs";
import { afterAll, describe, expect, it } from "vitest";

import { closeComputePool, compute } from "@/lib/server/compute/pool";
import { COMPUTE_NICENESS } from "@/lib/server/compute/worker/niceness";

afterAll(closeComputePool);

/** Nice value of each thread of this process (field 19 of /proc/<pid>/task/<tid>/stat). */
function threadNiceness(): number[] {
  return readdirSync(`/proc/${process.pid}/task`).map((tid) => {
    const stat = readFileSync(`/proc/${process.pid}/task/${tid}/stat`, "utf8");
    const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
    return Number(fields[16]);
  });
}

describe("compute threads yield to request threads", () => {
  it("runs its tasks on a thread at nice 10 while this thread stays at 0", async () => {
    const before = threadNiceness();
    expect(before.filter((n) => n === COMPUTE_NICENESS)).toEqual([]);
    await compute(
      {
        kind: "read-curve-csv",
        text: "strain,stress\n0,0\n0.001,10\n0.002,20\n",
        mapping: { strain: 0, stress: 1 },
      },
      null,
      "file reading",
    );
    const after = threadNiceness();
    expect(after).toContain(COMPUTE_NICENESS);
    expect(after.filter((n) => n !== 0 && n !== COMPUTE_NICENESS)).toEqual([]);
  });
});
