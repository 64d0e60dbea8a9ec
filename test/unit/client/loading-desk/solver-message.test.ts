import { describe, expect, it } from "vitest";
import { userMessage } from "@/workers/solver-client";

describe("solver error message", () => {
  it("keeps the error's first line and never a stack trace", () => {
    const err = new Error("E1: must be > 0\n    at PathRun (driver.ts:12:3)");
    const text = userMessage(err);
    expect(text).toBe("The solver could not run this case: E1: must be > 0");
    expect(text).not.toMatch(/driver\.ts|\bat\b/);
  });

  it("has a plain message for an empty error", () => {
    expect(userMessage(new Error(""))).toBe("The solver stopped unexpectedly.");
  });
});
