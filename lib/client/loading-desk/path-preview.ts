/**
 * The prescribed history of each component against increment, for the small preview: one
 * segment per leg, scaled per component and control kind (strain and stress have their own
 * scale). A leg whose control differs from the previous one starts from a value only the run
 * knows; its start is null.
 */
import type { ControlKind, Leg } from "@/lib/mechanics/types";

export interface PreviewSegment {
  from: number;
  to: number;
  control: ControlKind;
  start: number | null;
  end: number;
}

export interface PreviewStrip {
  component: 0 | 1 | 2;
  segments: PreviewSegment[];
  /** Largest |value| per control kind, for the scale (0 when none). */
  max: Record<ControlKind, number>;
}

export function previewStrips(legs: readonly Leg[]): { strips: PreviewStrip[]; total: number } {
  const total = legs.reduce((s, l) => s + l.increments, 0);
  const strips = ([0, 1, 2] as const).map((c): PreviewStrip => {
    const segments: PreviewSegment[] = [];
    const max = { strain: 0, stress: 0 };
    let at = 0;
    legs.forEach((leg, k) => {
      const prev = k === 0 ? null : legs[k - 1];
      const start = k === 0 ? 0 : prev!.control[c] === leg.control[c] ? prev!.target[c] : null;
      segments.push({
        from: at,
        to: at + leg.increments,
        control: leg.control[c],
        start,
        end: leg.target[c],
      });
      max[leg.control[c]] = Math.max(max[leg.control[c]], Math.abs(leg.target[c]));
      at += leg.increments;
    });
    return { component: c, segments, max };
  });
  return { strips, total };
}
