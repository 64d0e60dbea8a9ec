import { cleanup, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { UncertaintyTable } from "@/components/calibration/uncertainty-table";
import { fitUncertainty } from "@/lib/calibration/uncertainty";

afterEach(cleanup);

// A straight-line fit made up for the test: 10 samples, J = [1, x], unit scales.
const x = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9];
const r = [0.1, -0.2, 0.05, 0.15, -0.1, 0, 0.2, -0.15, -0.05, 0.1];

describe("UncertaintyTable", () => {
  it("shows each free parameter's error and interval, the correlations and what they assume", () => {
    const u = fitUncertainty(
      x.map((v) => [1, v, 0]),
      r,
      ["E1", "a1", "k6"],
      [1, 1, 1],
      [11000, 0.6, 1],
    )!;
    render(<UncertaintyTable uncertainty={u} law="sqrtY" />);
    const e1 = document.querySelector<HTMLElement>('tr[data-param="E1"]')!;
    expect(within(e1).getByText("11000 MPa")).toBeTruthy();
    expect(e1.textContent).toContain(u.params[0].se!.toPrecision(2));
    expect(e1.textContent).toContain("…");
    // k6 does not move the model: no error, said in words
    const k6 = document.querySelector('tr[data-param="k6"]')!;
    expect(k6.textContent).toContain("not informed");
    const corr = screen.getByRole("table", { name: /Correlation between the refined parameters/ });
    expect(corr.textContent).toContain(u.correlation[0][1]!.toFixed(2));
    expect(screen.getByText(/with 7 degrees of\s+freedom/)).toBeTruthy();
    expect(screen.getByTestId("uncertainty").textContent).toMatch(/not independent/);
  });
});
