import "server-only";

/** Quantities a conformance check compares: stresses (MPa) always, damages when uploaded. */
export const COMPARED_QUANTITIES = ["sig11", "sig22", "sig12", "d1", "d2"] as const;
export type ComparedQuantity = (typeof COMPARED_QUANTITIES)[number];

export interface ConformanceTolerance {
  /** Allowed stress deviation as a fraction of the peak stress magnitude (0.01 = 1 %). */
  stressFraction: number;
  /** Allowed absolute deviation of d1 and d2. */
  damage: number;
}

export const DEFAULT_TOLERANCE: ConformanceTolerance = { stressFraction: 0.01, damage: 0.005 };

export interface QuantityComparison {
  quantity: ComparedQuantity;
  /** Absolute tolerance applied (MPa for stresses). */
  tolerance: number;
  maxAbs: number;
  rms: number;
  /** Largest |difference| / |Craquelure's value| over points where that value is not tiny. */
  maxRel: number;
  /** The uploaded file's increment number where the deviation first exceeds the tolerance. */
  firstFailIncrement: number | null;
  passed: boolean;
}

export interface ConformanceResult {
  setId: string;
  tolerance: ConformanceTolerance;
  points: number;
  peakStress: number;
  quantities: QuantityComparison[];
  passed: boolean;
  firstFailIncrement: number | null;
  /** The column mapping the user chose (absent: found by header names). */
  mapping?: Partial<Record<string, number>>;
}
