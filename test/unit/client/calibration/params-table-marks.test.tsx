/** The refined-values table says where each value came from (issue 14, honest identifiability). */
import { cleanup, render } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { ParamsTable } from "@/components/calibration/params-table";
import { DEMO_PARAMS } from "@/lib/calibration/demo-curves";
import { REFINED, refinedValueMarks } from "@/lib/calibration/refined-value-marks";

afterEach(cleanup);

const wordFor = (container: HTMLElement, key: string) =>
  container.querySelector(`[data-param="${key}"]`)?.parentElement?.lastElementChild?.textContent;

describe("refined-values table", () => {
  it("shows refined, tied to axis 1, not informed by these records and starting value", () => {
    const outcome = { free: ["E1", "a1"], tied: ["E2", "G12"], notInformed: ["k6"] } as const;
    const { container } = render(
      <ParamsTable
        params={DEMO_PARAMS}
        identified={[...outcome.free]}
        sourceWord={REFINED}
        marks={refinedValueMarks(outcome)}
      />,
    );
    expect(wordFor(container, "E1")).toBe("refined");
    expect(wordFor(container, "E2")).toBe("tied to axis 1");
    expect(wordFor(container, "G12")).toBe("tied to axis 1");
    expect(wordFor(container, "k6")).toBe("not informed by these records");
    expect(wordFor(container, "b")).toBe("starting value");
  });

  it("marks dcrit, found from the records and kept by the refinement, as identified, kept", () => {
    const outcome = { free: ["E1"], tied: [], notInformed: [] } as const;
    const { container } = render(
      <ParamsTable
        params={DEMO_PARAMS}
        identified={[...outcome.free]}
        sourceWord={REFINED}
        marks={refinedValueMarks(outcome, ["E1", "dcrit"])}
      />,
    );
    expect(wordFor(container, "dcrit")).toBe("identified, kept");
    expect(wordFor(container, "E1")).toBe("refined");
  });
});
