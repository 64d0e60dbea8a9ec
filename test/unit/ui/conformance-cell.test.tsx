import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { ConformanceCell } from "@/components/scenarios/conformance-cell";

// Issue 13 item 4: the scenarios table's Conformance column.
afterEach(cleanup);

describe("ConformanceCell", () => {
  it("shows the verdict and when it was checked", () => {
    render(<ConformanceCell verdict={{ passed: false, checkedAt: "2026-12-02T09:00:00.000Z" }} />);
    expect(screen.getByTestId("conformance-verdict").textContent).toBe("fail2026-12-02 09:00 UTC");
  });

  it("shows a dash when the latest revision has no check", () => {
    render(<ConformanceCell verdict={null} />);
    expect(screen.getByTestId("conformance-verdict").textContent).toBe("—");
  });
});
