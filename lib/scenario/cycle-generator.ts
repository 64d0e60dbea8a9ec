/**
 * A shorter form of our own for repeated or growing-amplitude cycles on one component, and its
 * expansion into legs. The other two components are stress-controlled at 0 (a coupon test).
 *
 * Cycle k (k = 0 … count−1) expands to, each leg with `increments` increments:
 *   1. load:    `component` to peak.first + k·peak.step under peak.control
 *   2. unload:  `component` to unloadTo.value under unloadTo.control
 *   3. reverse: (optional) to reverse.first + k·reverse.step under reverse.control
 *   4. return:  (with 3) back to unloadTo.value under unloadTo.control
 * Example (spec D.18): peaks ε11 = 0.002, 0.004, … 0.014, unload to σ11 = 0, 60 increments:
 *   { kind: "cycles", component: "11", peak: { control: "strain", first: 0.002, step: 0.002 },
 *     count: 7, increments: 60, unloadTo: { control: "stress", value: 0 } }
 * In a file a generator is stored with `firstLeg`, the index in path.legs of its first leg,
 * next to the expanded legs (scenario-file.md); the legs are what runs.
 */
import { z } from "zod";
import type { ControlKind, Leg } from "@/lib/mechanics/types";
import { choice, finiteNumber, integerIn, objectError } from "./schema-helpers";

const COMPONENT_INDEX = { "11": 0, "22": 1, "12": 2 } as const;
export type CycleComponent = keyof typeof COMPONENT_INDEX;

const controlKind = choice(["strain", "stress"]);
const ramp = z.strictObject(
  { control: controlKind, first: finiteNumber(), step: finiteNumber().default(0) },
  objectError("an object"),
);

export const cycleGeneratorSchema = z.strictObject(
  {
    kind: z.literal("cycles", { error: 'must be "cycles"' }),
    component: choice(["11", "22", "12"]),
    peak: ramp,
    count: integerIn(1, 10_000),
    increments: integerIn(1, 1_000_000),
    unloadTo: z.strictObject(
      { control: controlKind, value: finiteNumber() },
      objectError("an object"),
    ),
    reverse: ramp.optional(),
  },
  objectError("an object"),
);
export type CycleGenerator = z.output<typeof cycleGeneratorSchema>;
export type CycleGeneratorInput = z.input<typeof cycleGeneratorSchema>;

export const placedGeneratorSchema = cycleGeneratorSchema.extend({
  firstLeg: integerIn(0, Infinity),
});
export type PlacedGenerator = z.output<typeof placedGeneratorSchema>;

/** One leg that moves `component` and holds the other two at zero stress. */
function legOn(component: CycleComponent, control: ControlKind, value: number, n: number): Leg {
  const index = COMPONENT_INDEX[component];
  const leg: Leg = {
    control: ["stress", "stress", "stress"],
    target: [0, 0, 0],
    increments: n,
  };
  leg.control[index] = control;
  leg.target[index] = value;
  return leg;
}

/** The legs a cycle generator stands for. */
export function expandCycles(generator: CycleGenerator): Leg[] {
  const { component, peak, unloadTo, reverse, increments: n } = generator;
  const legs: Leg[] = [];
  for (let k = 0; k < generator.count; k++) {
    legs.push(legOn(component, peak.control, peak.first + k * peak.step, n));
    legs.push(legOn(component, unloadTo.control, unloadTo.value, n));
    if (reverse) {
      legs.push(legOn(component, reverse.control, reverse.first + k * reverse.step, n));
      legs.push(legOn(component, unloadTo.control, unloadTo.value, n));
    }
  }
  return legs;
}

/** An item of a path being edited: a plain leg or a generator. */
export type PathItem = { leg: Leg } | { generator: CycleGenerator };

/** Flattens edited path items into what a file stores: the legs and the placed generators. */
export function expandGenerators(items: readonly PathItem[]): {
  legs: Leg[];
  generators: PlacedGenerator[];
} {
  const legs: Leg[] = [];
  const generators: PlacedGenerator[] = [];
  for (const item of items) {
    if ("leg" in item) {
      legs.push(item.leg);
    } else {
      generators.push({ ...item.generator, firstLeg: legs.length });
      legs.push(...expandCycles(item.generator));
    }
  }
  return { legs, generators };
}

const sameNumber = (x: number, y: number) => Math.abs(x - y) <= 1e-12 * Math.max(1, Math.abs(x));

function sameLeg(a: Leg, b: Leg): boolean {
  return (
    a.increments === b.increments &&
    a.control.every((c, i) => c === b.control[i]) &&
    a.target.every((t, i) => sameNumber(t, b.target[i]))
  );
}

/**
 * Why a stored generator does not match the stored legs it claims to have produced, or null.
 * A mismatch means the legs were edited without the generator (or the other way round).
 */
export function generatorMismatch(placed: PlacedGenerator, legs: readonly Leg[]): string | null {
  const expected = expandCycles(placed);
  const end = placed.firstLeg + expected.length;
  if (end > legs.length) {
    return `expands to ${expected.length} legs from legs[${placed.firstLeg}], but the path has only ${legs.length}`;
  }
  for (let i = 0; i < expected.length; i++) {
    if (!sameLeg(expected[i], legs[placed.firstLeg + i])) {
      return `does not match path.legs[${placed.firstLeg + i}]; store the expanded legs or remove the generator`;
    }
  }
  return null;
}
