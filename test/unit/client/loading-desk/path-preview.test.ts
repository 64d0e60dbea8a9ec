import { describe, expect, it } from "vitest";
import type { Leg } from "@/lib/mechanics/types";
import { previewStrips } from "@/lib/client/loading-desk/path-preview";

const legs: Leg[] = [
  { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments: 100 },
  { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 50 },
  { control: ["strain", "stress", "stress"], target: [-0.005, 0, 0], increments: 100 },
];

describe("path preview", () => {
  it("lays legs end to end and knows a start only when the control stays the same", () => {
    const { strips, total } = previewStrips(legs);
    expect(total).toBe(250);
    const s11 = strips[0].segments;
    expect(s11.map((s) => [s.from, s.to, s.control, s.start, s.end])).toEqual([
      [0, 100, "strain", 0, 0.01],
      [100, 150, "stress", null, 0],
      [150, 250, "strain", null, -0.005],
    ]);
    expect(strips[0].max).toEqual({ strain: 0.01, stress: 0 });
    expect(strips[1].segments[1].start).toBe(0);
  });
});
