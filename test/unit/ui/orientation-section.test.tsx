import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { OrientationSection } from "@/components/calibration/orientation-section";
import { alignedPly } from "@/lib/calibration/micromechanics/halpin-tsai";

afterEach(cleanup);

// Spec A.5: SMC-like ply of A.4; the skin/core/skin preset is A.5's balanced stack.
const constituents = { Ef: 72000, nuf: 0.22, Em: 3500, num: 0.35, Vf: 0.2, aspect: 100 };

describe("Orientation state section", () => {
  it("shows the balanced stack, the roses, and hands on E1, E2, nu12, G12, thetaD with provenance", () => {
    const onUse = vi.fn();
    render(
      <OrientationSection
        ply={alignedPly(constituents)}
        constituents={constituents}
        onUse={onUse}
      />,
    );
    expect(screen.getByTestId("orientation-result").textContent).toContain("E1 = 9698 MPa");
    expect(screen.getByTestId("stiffness-rose").querySelectorAll("path")).toHaveLength(3);
    expect(screen.getByTestId("orientation-pictures").querySelectorAll("figure")).toHaveLength(4);
    fireEvent.click(screen.getByRole("button", { name: "Use as parameter set" }));
    const used = onUse.mock.calls[0][0];
    expect(used.E1 / 9698.2 - 1).toBeLessThan(1e-4);
    expect(used.thetaD).toBeCloseTo(0, 9);
    expect(used.provenance).toMatchObject({
      kind: "orientation-state",
      closure: "exact",
      constituents,
    });
    expect(used.provenance.layers).toHaveLength(3);
  });

  it("says which row is wrong when the fractions or a tensor are off", () => {
    render(
      <OrientationSection
        ply={alignedPly(constituents)}
        constituents={constituents}
        onUse={vi.fn()}
      />,
    );
    fireEvent.change(screen.getByLabelText("a12 of row 2"), { target: { value: "0.45" } });
    expect(screen.getByText(/Core \(row 2\): a12² must not exceed/)).toBeTruthy();
    expect(screen.queryByRole("button", { name: "Use as parameter set" })).toBeNull();
  });

  it("a rotated single layer moves the damage frame to its flow direction", () => {
    const onUse = vi.fn();
    render(
      <OrientationSection
        ply={alignedPly(constituents)}
        constituents={constituents}
        onUse={onUse}
      />,
    );
    fireEvent.click(screen.getByRole("button", { name: "One layer" }));
    fireEvent.change(screen.getByLabelText("a11 of row 1"), { target: { value: "0.7" } });
    fireEvent.change(screen.getByLabelText("a12 of row 1"), { target: { value: "0.2" } });
    fireEvent.click(screen.getByRole("button", { name: "Use as parameter set" }));
    expect(onUse.mock.calls[0][0].thetaD).toBeCloseTo(22.5, 9); // spec A.5 example
  });
});
