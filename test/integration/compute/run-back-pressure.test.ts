/**
 * Back-pressure of a streamed run (issue 11): the compute thread posts a chunk only when the
 * request thread has granted one (lib/server/compute/chunk-credit.ts), so a run whose response
 * is not read holds a few chunks, not its whole output, in the web process. Without the credit
 * check the worker posts every chunk as fast as it formats them and this test sees them all.
 */
import { afterAll, describe, expect, it } from "vitest";

import { grantChunk, newChunkCredit } from "@/lib/server/compute/chunk-credit";
import { closeComputePool, startTask } from "@/lib/server/compute/pool";
import type { PortMessage } from "@/lib/server/compute/worker/task-types";

import { DEMO_FILE } from "../support/workspace";

afterAll(closeComputePool);

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe("a streamed run waits for the response", () => {
  it("posts only the chunks it was granted, and one more per grant", async () => {
    const scenario = structuredClone(DEMO_FILE) as Record<string, unknown> & typeof DEMO_FILE;
    // 100,000 increments: ~25 chunks of 4,096 rows (results-csv.ts), far more than granted.
    scenario.path.legs = [
      { control: ["strain", "stress", "stress"], target: [0.004, 0, 0], increments: 100_000 },
    ];
    const credit = newChunkCredit(2);
    const task = startTask<null>(
      { kind: "run", request: { scenario, setId: null, format: "csv" }, credit },
      null,
      "run",
    );
    task.done.catch(() => undefined);
    const seen: PortMessage["type"][] = [];
    task.onMessage((message) => seen.push(message.type));
    const chunks = () => seen.filter((t) => t === "chunk").length;
    /** Waits (on a loaded machine a nice-10 thread can be slow) until `n` chunks have come. */
    const until = async (n: number) => {
      const deadline = Date.now() + 20_000;
      while (chunks() < n && Date.now() < deadline) await sleep(50);
    };
    try {
      await until(2);
      await sleep(2_000); // time to format and post several more chunks, were it allowed
      expect(chunks()).toBe(2);
      grantChunk(credit);
      await until(3);
      await sleep(2_000);
      expect(chunks()).toBe(3);
      expect(seen).not.toContain("end");
    } finally {
      task.cancel();
      await task.done.catch(() => undefined);
    }
  });
});
