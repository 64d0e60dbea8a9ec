import { readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { readRunRequest } from "@/lib/server/handoff/runs/run-request";

const demo = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
);

function longPath(increments: number) {
  const file = structuredClone(demo);
  file.path.legs = [{ control: ["strain", "stress", "stress"], target: [0.001, 0, 0], increments }];
  return file;
}

describe("readRunRequest", () => {
  it("takes the format from the wrapper, then the query, then Accept, else CSV", () => {
    expect(readRunRequest({ scenario: demo, format: "json" }, { format: "csv" }, null).format).toBe(
      "json",
    );
    expect(readRunRequest(demo, { format: "json" }, "text/csv").format).toBe("json");
    expect(readRunRequest(demo, {}, "application/json").format).toBe("json");
    expect(readRunRequest(demo, {}, "*/*").format).toBe("csv");
  });

  it("rejects more than 1,000,000 increments before validating", () => {
    expect(() => readRunRequest(longPath(1_000_001), {}, null)).toThrow(
      expect.objectContaining({ code: "invalid:too-large" }),
    );
  });

  it("rejects a wrapper with unknown fields and a body that is not an object", () => {
    expect(() => readRunRequest({ scenario: demo, sett: "A" }, {}, null)).toThrow();
    expect(() => readRunRequest([demo], {}, null)).toThrow(
      expect.objectContaining({ code: "invalid:body" }),
    );
  });
});
