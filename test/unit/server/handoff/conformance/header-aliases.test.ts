import { describe, expect, it } from "vitest";

import { HISTORY_HEADER_ALIASES, readHistory } from "@/lib/server/handoff/conformance/read-history";
import { HISTORY_CHANNELS } from "@/lib/server/handoff/conformance/upload-schema";

/** Output codes of another finite-element program: never matched without the user's say. */
const FOREIGN_CODES = ["inc", "frame", "le11", "le22"];

describe("conformance upload: header names found without a mapping", () => {
  it("lists our own names and plain words for every channel, and none of the foreign codes", () => {
    expect(HISTORY_HEADER_ALIASES).toEqual({
      increment: ["increment", "step"],
      eps11: ["eps11", "ε11", "strain11"],
      eps22: ["eps22", "ε22", "strain22"],
      gam12: ["gam12", "γ12", "shear12", "shearstrain12", "gamma12"],
      sig11: ["sig11", "σ11", "stress11", "sigma11"],
      sig22: ["sig22", "σ22", "stress22", "sigma22"],
      sig12: ["sig12", "σ12", "τ12", "stress12", "shearstress12", "sigma12", "tau12"],
      d1: ["d1", "damage1"],
      d2: ["d2", "damage2"],
    });
    const all = Object.values(HISTORY_HEADER_ALIASES).flat();
    for (const code of FOREIGN_CODES) expect(all).not.toContain(code);
    for (const channel of HISTORY_CHANNELS) expect(all).toContain(channel);
  });

  it("reads plain words with units, spaces and symbols", () => {
    const csv =
      "Increment,Strain 11 [mm/mm],strain_22,Shear strain 12,σ11 (MPa),stress22,τ12,damage 1\n" +
      "0,0,0,0,0,0,0,0\n1,0.001,0,0,11,0,0,0\n";
    const read = readHistory(csv);
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(Array.from(read.history.sig11!)).toEqual([0, 11]);
    expect(Array.from(read.history.increment!)).toEqual([0, 1]);
  });

  it("does not guess the foreign codes: such a file needs a mapping", () => {
    const read = readHistory("inc,le11,le22,le12,s11,s22,s12\n0,0,0,0,0,0,0\n");
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.error.message).toMatch(/no column for eps11, eps22/);
  });
});
