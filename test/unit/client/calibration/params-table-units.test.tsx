/** The fit and identify tables write each parameter's unit, the slopes' for the law in use. */
import { cleanup, render } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { paramUnit, ParamsTable } from "@/components/calibration/params-table";
import { UncertaintyTable } from "@/components/calibration/uncertainty-table";
import { DEMO_PARAMS } from "@/lib/calibration/demo-curves";
import type { FitUncertainty } from "@/lib/calibration/uncertainty";

afterEach(cleanup);

const unitCell = (container: HTMLElement, key: string) =>
  container.querySelector(`[data-param="${key}"]`)?.nextElementSibling?.textContent;

describe("parameter units on the fit and identify pages", () => {
  // spec A.3 / damage-law.md parameter table: a in MPa^-0.5 for the √Y law, MPa^-1 for linear in Y
  it("gives a1, a2 the √Y law's unit", () => {
    const { container } = render(<ParamsTable params={{ ...DEMO_PARAMS, law: "sqrtY" }} />);
    expect(unitCell(container, "a1")).toBe("MPa⁻⁰·⁵");
    expect(unitCell(container, "a2")).toBe("MPa⁻⁰·⁵");
    expect(unitCell(container, "E1")).toBe("MPa");
    expect(unitCell(container, "alpha")).toBe("mm/mm");
    expect(unitCell(container, "nu12")).toBe("");
  });

  it("gives a1, a2 the linear law's unit", () => {
    const { container } = render(<ParamsTable params={{ ...DEMO_PARAMS, law: "linY" }} />);
    expect(unitCell(container, "a1")).toBe("MPa⁻¹");
    expect(unitCell(container, "a2")).toBe("MPa⁻¹");
  });

  it("the uncertainty table writes the same units", () => {
    const uncertainty: FitUncertainty = {
      level: 0.95,
      degreesOfFreedom: 10,
      residualSd: 0.01,
      params: [{ name: "a1", value: 0.6, se: 0.01, low: 0.58, high: 0.62 }],
      correlation: [[1]],
    };
    const { container } = render(<UncertaintyTable uncertainty={uncertainty} law="linY" />);
    expect(container.querySelector('[data-param="a1"]')?.textContent).toContain("0.6000 MPa⁻¹");
    expect(paramUnit("a1", "sqrtY")).toBe("MPa⁻⁰·⁵");
  });
});
