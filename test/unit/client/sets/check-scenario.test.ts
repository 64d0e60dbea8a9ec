import { describe, expect, it } from "vitest";

import { checkScenario } from "@/lib/client/sets/check-scenario";
import { PRESETS } from "@/lib/client/loading-desk/presets";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";

describe("checkScenario", () => {
  const file = checkScenario({ ...PRESETS[0].params, label: "SMC fit" });

  it("is a valid scenario file carrying the set under its library name", () => {
    expect(parseScenarioFile(file).ok).toBe(true);
    expect(file.parameterSets.map((s) => s.label)).toEqual(["SMC fit"]);
    expect(file.name).toBe("Check of SMC fit");
  });

  it("goes to compression after unloading, then runs seven growing cycles", () => {
    const legs = file.path.legs;
    // 4 legs of tension/unload/compression/unload + 7 cycles of 2 legs.
    expect(legs).toHaveLength(4 + 14);
    expect(JSON.stringify(legs[2])).toContain("-0.005");
    expect(file.path.generators).toHaveLength(1);
    expect(file.path.generators![0].firstLeg).toBe(4);
  });
});
