/** Inputs shared by the scenario tests. The demo SMC set is spec A.3's invented demo set. */
import type { Leg } from "@/lib/mechanics/types";
import { SCENARIO_FORMAT } from "@/lib/scenario/scenario-schema";

/** Spec A.3 demo SMC set [I], required fields only. */
export const DEMO_REQUIRED = {
  E1: 11000,
  E2: 11000,
  nu12: 0.3,
  G12: 4230.769,
  Y0_1: 0.05,
  Y0_2: 0.05,
  a1: 0.6,
  a2: 0.6,
  b: 0.3,
  alpha: 0.005,
  beta: 0.005,
  dcrit: 0.45,
} as const;

export const REQUIRED_FIELDS = Object.keys(DEMO_REQUIRED) as (keyof typeof DEMO_REQUIRED)[];

/** Spec C.1's tension – unload – compression path. */
export const DEMO_LEGS: Leg[] = [
  { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments: 100 },
  { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 50 },
  { control: ["strain", "stress", "stress"], target: [-0.005, 0, 0], increments: 100 },
];

/** A minimal valid scenario file, as parsed JSON. */
export function demoFile(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    format: SCENARIO_FORMAT,
    name: "demo",
    parameterSets: [{ ...DEMO_REQUIRED }],
    path: { legs: structuredClone(DEMO_LEGS) },
    ...overrides,
  };
}
