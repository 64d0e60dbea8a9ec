import "server-only";

/**
 * The standard load cases of a reference bundle, scaled to each parameter set: strain levels are
 * multiples of the set's onset strain sqrt(2·Y0/E), so every case reaches well into damage
 * whatever the stiffness. Paths use the scenario file's leg form (11, 22, 12; engineering shear).
 */
import type { Leg } from "@/lib/mechanics/types";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

export interface LoadCase {
  id: string;
  title: string;
  legs: Leg[];
}

/** How far past the onset strain the monotonic cases go. */
const REACH = 4;
const INCREMENTS = 200;

const S = "stress" as const;
const E = "strain" as const;

function uniaxial(axis: 0 | 1 | 2, target: number, increments = INCREMENTS): Leg {
  const control: Leg["control"] = [S, S, S];
  control[axis] = E;
  const t: Leg["target"] = [0, 0, 0];
  t[axis] = target;
  return { control, target: t, increments };
}

const unloadToZeroStress = (increments: number): Leg => ({
  control: [S, S, S],
  target: [0, 0, 0],
  increments,
});

export function onsetStrains(set: ParameterSet) {
  return {
    e1: Math.sqrt((2 * set.Y0_1) / set.E1),
    e2: Math.sqrt((2 * set.Y0_2) / set.E2),
    g12: Math.sqrt((2 * set.Y0_1) / set.G12),
  };
}

export function standardLoadCases(set: ParameterSet): LoadCase[] {
  const { e1, e2, g12 } = onsetStrains(set);
  const cycles: Leg[] = [];
  for (let k = 1; k <= 4; k++) {
    cycles.push(uniaxial(0, (REACH * e1 * k) / 4, 50), unloadToZeroStress(25));
  }
  return [
    { id: "tension-1", title: "Uniaxial tension along 1", legs: [uniaxial(0, REACH * e1)] },
    { id: "tension-2", title: "Uniaxial tension along 2", legs: [uniaxial(1, REACH * e2)] },
    {
      id: "compression-1",
      title: "Uniaxial compression along 1",
      legs: [uniaxial(0, -REACH * e1)],
    },
    { id: "shear-12", title: "In-plane shear", legs: [uniaxial(2, REACH * g12)] },
    {
      id: "cycles-1",
      title: "Growing cycles along 1 (tension, unload to zero stress)",
      legs: cycles,
    },
    {
      id: "tension-unload-compression-1",
      title: "Tension, unload, compression along 1",
      legs: [uniaxial(0, REACH * e1), unloadToZeroStress(50), uniaxial(0, (-REACH * e1) / 2)],
    },
  ];
}
