import { describe, expect, it } from "vitest";

import { keyValues, provenanceText } from "@/lib/workspace-client/parameter-set-words";

describe("parameter set rows", () => {
  it("shows the key values in a fixed order and skips missing ones", () => {
    expect(keyValues({ dcrit: 0.45, E1: 11000, nu12: 0.3, Y0_1: 0.05 })).toEqual([
      ["E1", "11000"],
      ["Y0_1", "0.05"],
      ["dcrit", "0.45"],
    ]);
  });

  it("says where a set comes from", () => {
    expect(provenanceText({ kind: "fitted", records: ["a", "b"], method: "least squares" })).toBe(
      "fitted from 2 test records (least squares)",
    );
    expect(provenanceText({ kind: "fitted", records: ["a"] })).toBe("fitted from 1 test record");
    expect(provenanceText({ kind: "constituents" })).toBe("derived from constituents");
    expect(provenanceText({ kind: "typed" })).toBe("typed in");
  });
});
