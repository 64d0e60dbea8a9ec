import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { useState } from "react";
import { afterEach, describe, expect, it } from "vitest";

import { CouponOrientationFields } from "@/components/records/coupon-orientation-fields";
import { CouponOrientationView } from "@/components/records/coupon-orientation-view";
import {
  readCouponOrientation,
  type CouponOrientationDraft,
} from "@/lib/calibration/micromechanics/coupon-orientation";

afterEach(cleanup);

let latest: CouponOrientationDraft | null = null;
function Harness() {
  const [value, setValue] = useState<CouponOrientationDraft | null>(null);
  const onChange = (next: CouponOrientationDraft | null) => {
    latest = next; // the test reads what the form handed on
    setValue(next);
  };
  return <CouponOrientationFields idPrefix="t" value={value} onChange={onChange} />;
}

describe("Coupon orientation on the upload form", () => {
  it("is off by default; switched on, it reads the cut angle and a layer's tensor", () => {
    render(<Harness />);
    expect(screen.queryByLabelText(/Cut angle φ/)).toBeNull();
    fireEvent.click(screen.getByRole("checkbox"));
    fireEvent.change(screen.getByLabelText(/Cut angle φ/), { target: { value: "30" } });
    fireEvent.change(screen.getByLabelText("a11 of layer 1"), { target: { value: "0.7" } });
    fireEvent.change(screen.getByLabelText("a12 of layer 1"), { target: { value: "0.2" } });
    const read = readCouponOrientation(latest!);
    expect(read).toEqual({
      ok: true,
      value: { cutAngle: 30, layers: [{ fraction: 1, a11: 0.7, a12: 0.2 }] },
    });
  });

  it("the skin/core/skin preset gives three layers; a bad tensor is named by its label", () => {
    render(<Harness />);
    fireEvent.click(screen.getByRole("checkbox"));
    fireEvent.click(screen.getByRole("button", { name: "Skin/core/skin" }));
    expect(latest!.layers).toHaveLength(3);
    fireEvent.change(screen.getByLabelText("a12 of layer 2"), { target: { value: "0.45" } });
    const read = readCouponOrientation(latest!); // 0.45² = 0.2025 > 0.2·0.8 = 0.16
    expect(read.ok).toBe(false);
    expect(!read.ok && read.message).toContain(
      "Coupon orientation, layer 2, a12: a12² must not exceed",
    );
  });
});

describe("Coupon orientation on the record page", () => {
  it("shows thetaD = thetaA − φ for spec A.5's principal-direction example cut at 30°", () => {
    render(
      <CouponOrientationView
        orientation={{ cutAngle: 30, layers: [{ fraction: 1, a11: 0.7, a12: 0.2 }] }}
      />,
    );
    const text = screen.getByTestId("record-coupon-orientation").textContent;
    expect(text).toContain("thetaA 22.5°");
    expect(text).toContain("thetaD = thetaA − φ = -7.5°");
  });
});
