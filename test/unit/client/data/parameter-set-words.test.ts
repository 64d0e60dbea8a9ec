import { describe, expect, it } from "vitest";

import { allValues, keyValues, provenanceText } from "@/lib/client/data/parameter-set-words";

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

  it("lists every value in the law's order with units, the label left out", () => {
    const rows = allValues({ label: "x", dcrit: 0.45, zz: 1, E1: 11000, law: "sqrtY" });
    expect(rows.map((r) => r.symbol)).toEqual(["E1", "dcrit", "law", "zz"]);
    expect(rows[0].text).toBe("11000 MPa");
    expect(rows[2].text).toBe("sqrtY");
    expect(allValues({ a1: 0.6, law: "linY" })[0].text).toBe("0.6 MPa⁻¹");
    expect(allValues({ a1: 0.6 })[0].text).toBe("0.6 MPa⁻⁰·⁵");
  });
});
