import { describe, expect, it } from "vitest";

import { overBudget, ComputeBusy } from "@/lib/server/compute/errors";
import { computeLimits, defaultComputeThreads } from "@/lib/server/compute/limits";
import { errorResponse } from "@/lib/server/http/respond";

describe("computeLimits", () => {
  it("leaves one core to the request thread and defaults the caps", () => {
    expect(computeLimits({}, 2)).toEqual({
      threads: 1,
      maxTasks: 8,
      maxTasksPerPerson: 2,
      budgetMs: 20_000,
      retryAfterSeconds: 5,
    });
    expect(computeLimits({}, 8)).toMatchObject({ threads: 7, maxTasks: 28 });
    expect(computeLimits({}, 1).threads).toBe(1);
  });

  it("takes positive whole numbers from the environment and ignores anything else", () => {
    const limits = computeLimits(
      {
        COMPUTE_THREADS: "3",
        COMPUTE_MAX_TASKS: "0",
        COMPUTE_MAX_TASKS_PER_PERSON: "x",
        COMPUTE_TIME_BUDGET_MS: "1500",
        COMPUTE_RETRY_AFTER_S: "-2",
      },
      2,
    );
    expect(limits).toEqual({
      threads: 3,
      maxTasks: 12,
      maxTasksPerPerson: 2,
      budgetMs: 1500,
      retryAfterSeconds: 5,
    });
  });

  it("shares cores − 1 compute threads among the app processes, at least one each", () => {
    // The rule of limits.ts: threads × processes ≤ cores − 1 wherever one thread each fits.
    expect(defaultComputeThreads(8, 1)).toBe(7);
    expect(defaultComputeThreads(8, 8)).toBe(1); // 8 processes × 1 = 8: one each is the floor
    expect(defaultComputeThreads(16, 4)).toBe(3); // 4 × 3 = 12 ≤ 15
    expect(defaultComputeThreads(16, 16)).toBe(1);
    expect(defaultComputeThreads(9, 2)).toBe(4); // 2 × 4 = 8 ≤ 8
    expect(defaultComputeThreads(2, 2)).toBe(1);
    expect(defaultComputeThreads(1, 2)).toBe(1);
    expect(computeLimits({ CRAQUELURE_APP_PROCESSES: "4" }, 16).threads).toBe(3);
    expect(computeLimits({ CRAQUELURE_APP_PROCESSES: "4", COMPUTE_THREADS: "5" }, 16).threads).toBe(
      5,
    );
    expect(computeLimits({ CRAQUELURE_APP_PROCESSES: "junk" }, 8).threads).toBe(7);
  });

  it("still reads the older RUN_TIME_BUDGET_MS when the new name is unset", () => {
    expect(computeLimits({ RUN_TIME_BUDGET_MS: "9000" }, 2).budgetMs).toBe(9000);
  });
});

describe("the pool's messages", () => {
  it("says how long the run took, that it stopped, and what to change", () => {
    const error = overBudget("run", 20_000);
    expect(error.code).toBe("invalid:time-budget");
    expect(error.message).toBe(
      "The run took longer than 20 s and was stopped. Try fewer increments (or fewer legs), or run the file on your own machine with the command-line driver (npm run drive).",
    );
    expect(overBudget("report", 1250).message).toMatch(/^The report took longer than 1\.3 s/);
  });

  it("answers a person's cap as rate-limited and a full instance as unavailable", () => {
    const mine = new ComputeBusy("person", 5, 2);
    expect(mine.code).toBe("rate-limited:compute");
    expect(mine.retryAfterSeconds).toBe(5);
    expect(mine.message).toBe(
      "You already have 2 calculations running; wait for one to finish and try again in 5 s.",
    );
    expect(new ComputeBusy("instance", 5, 2).code).toBe("unavailable:compute");
  });

  it("answers 429 and 503 with Retry-After through the API's error answer", async () => {
    const person = errorResponse(new ComputeBusy("person", 4, 2));
    expect(person.status).toBe(429);
    expect(person.headers.get("retry-after")).toBe("4");
    const instance = errorResponse(new ComputeBusy("instance", 6, 2));
    expect(instance.status).toBe(503);
    expect(instance.headers.get("retry-after")).toBe("6");
    expect((await instance.json()).error.message).toBe(
      "The server is busy with other calculations; try again in 6 s.",
    );
  });
});
