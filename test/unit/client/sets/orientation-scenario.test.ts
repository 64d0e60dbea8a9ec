import { describe, expect, it } from "vitest";

import { decodeState, URL_STATE_KEY } from "@/lib/client/loading-desk/url-state";
import {
  ORIENTATION_SET_LABEL,
  orientationSandboxLink,
  orientationScenario,
} from "@/lib/client/sets/orientation-scenario";
import { DEMO_SMC } from "@/lib/mechanics/demo-set";

// Values of the shape an orientation state gives (spec A.5); made up for the test.
const values = { E1: 9698.2, E2: 7411.5, nu12: 0.3312, G12: 3012.4, thetaD: 12.5 };

describe("orientationScenario", () => {
  it("puts the state's elastic constants and frame over the demo damage values, beside the demo set", () => {
    const file = orientationScenario(values);
    const [a, b] = file.parameterSets;
    expect(a).toMatchObject({ id: "A", ...values, frame: "fixed", label: ORIENTATION_SET_LABEL });
    expect(a.Y0_1).toBe(DEMO_SMC.Y0_1);
    expect(a.a1).toBe(DEMO_SMC.a1);
    expect(b).toMatchObject({ id: "B", E1: DEMO_SMC.E1, thetaD: DEMO_SMC.thetaD });
    expect(file.path.legs.length).toBeGreaterThan(4);
  });

  it("rides whole in a sandbox link that the sandbox reads back as a valid scenario", () => {
    const link = orientationSandboxLink(values);
    expect(link.startsWith(`/sandbox#${URL_STATE_KEY}=`)).toBe(true);
    const decoded = decodeState(link.slice(link.indexOf("=") + 1));
    expect(decoded.ok).toBe(true);
    if (!decoded.ok) return;
    expect(decoded.scenario.parameterSets[0]).toMatchObject(values);
  });
});
