import { describe, expect, it } from "vitest";

import { decodeState } from "@/lib/client/loading-desk/url-state";
import { sandboxLinkForSet } from "@/lib/client/data/sandbox-link";
import { PRESETS } from "@/lib/client/loading-desk/presets";

describe("a library set tried in the sandbox", () => {
  it("opens as a valid scenario with that set, named after it", () => {
    const { label: _label, ...values } = PRESETS[0].params;
    const link = sandboxLinkForSet("SMC batch 7", { ...values, E1: 12345 });
    expect(link.startsWith("/sandbox#s=")).toBe(true);
    const decoded = decodeState(link.slice("/sandbox#s=".length));
    if (!decoded.ok) throw new Error(decoded.errors.join("; "));
    expect(decoded.scenario.parameterSets).toHaveLength(1);
    expect(decoded.scenario.parameterSets[0]).toMatchObject({
      id: "A",
      label: "SMC batch 7",
      E1: 12345,
    });
    expect(decoded.scenario.path.legs.length).toBeGreaterThan(0);
  });
});
