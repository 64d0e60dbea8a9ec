/**
 * zod schema of one parameter set of a scenario file (spec damage-law.md A.3, scenario-file.md).
 * Single-field ranges live on the fields; rules that involve several fields (nu12 against
 * E1/E2, a_i against Y0_i and the law, dcrit against dmax, the onset frame's isotropy) are
 * checked together afterwards and reported on the field the user most likely has to change.
 */
import { z } from "zod";
import type { MaterialParams } from "@/lib/mechanics/types";
import { rangeOf } from "./parameter-fields";
import { choice, finiteNumber, numberIn, objectError } from "./schema-helpers";

/** A parameter set as the rest of the product uses it: the law's parameters plus a name. */
export type ParameterSet = MaterialParams & { id: string; label: string };

const positive = (symbol: string) => numberIn((x) => x > 0, rangeOf(symbol));
const within = (symbol: string, lo: number, hi: number) =>
  numberIn((x) => x >= lo && x <= hi, rangeOf(symbol));

/** Relative tolerance of the isotropy test for frame "onset" (spec B.8). */
const ISOTROPY_TOLERANCE = 1e-6;

const fieldsSchema = z.strictObject(
  {
    // The id is optional in the file; the scenario schema assigns "A", "B", … by position.
    id: z
      .string({ error: "must be a string" })
      .trim()
      .min(1, { error: "must not be empty" })
      .max(64, { error: "must be at most 64 characters" })
      .optional(),
    label: z
      .string({ error: "must be a string" })
      .max(200, { error: "must be at most 200 characters" })
      .default(""),
    E1: positive("E1"),
    E2: positive("E2"),
    nu12: finiteNumber(),
    G12: positive("G12"),
    Y0_1: positive("Y0_1"),
    Y0_2: positive("Y0_2"),
    a1: finiteNumber(),
    a2: finiteNumber(),
    b: within("b", 0, 1),
    k6: within("k6", 0, 3).default(1),
    alpha: within("alpha", 0, 0.05),
    beta: within("beta", 0, 0.05),
    dcrit: finiteNumber(),
    dmax: within("dmax", 0.9, 0.999).default(0.99),
    law: choice(["sqrtY", "linY"]).default("sqrtY"),
    frame: choice(["fixed", "onset"]).default("fixed"),
    thetaD: finiteNumber().default(0),
    Xc: numberIn((x) => x > 0, rangeOf("Xc"))
      .nullable()
      .default(null),
    onFailure: choice(["stop", "continue"]).default("stop"),
  },
  objectError("an object"),
);

type Fields = z.output<typeof fieldsSchema>;
type Report = (field: keyof Fields, message: string) => void;

const isNum = (x: unknown): x is number => typeof x === "number" && Number.isFinite(x);

/** Cross-field rules; each runs only when the fields it needs are themselves valid numbers. */
function checkCrossFieldRules(v: Partial<Record<keyof Fields, unknown>>, report: Report): void {
  if (isNum(v.nu12) && isNum(v.E1) && isNum(v.E2) && v.E1 > 0 && v.E2 > 0) {
    const bound = Math.sqrt(v.E1 / v.E2);
    if (!(Math.abs(v.nu12) < bound)) {
      report("nu12", `must satisfy |nu12| < sqrt(E1/E2) = ${bound.toPrecision(6)}`);
    }
  }
  const law = v.law === undefined ? "sqrtY" : v.law;
  for (const [a, y0] of [
    ["a1", "Y0_1"],
    ["a2", "Y0_2"],
  ] as const) {
    const slope = v[a];
    const threshold = v[y0];
    if (!isNum(slope) || !isNum(threshold) || threshold <= 0) continue;
    // The envelope needs a stress peak before dmax: a·sqrt(Y0) < 1 (sqrtY), 2·a·Y0 < 1 (linY).
    if (law === "sqrtY" && !(slope > 0 && slope * Math.sqrt(threshold) < 1)) {
      report(a, `must be > 0 and ${a}·sqrt(${y0}) < 1`);
    } else if (law === "linY" && !(slope > 0 && 2 * slope * threshold < 1)) {
      report(a, `must be > 0 and 2·${a}·${y0} < 1`);
    }
  }
  const dmax = v.dmax === undefined ? 0.99 : v.dmax;
  if (isNum(v.dcrit) && isNum(dmax) && !(v.dcrit > 0 && v.dcrit < dmax)) {
    report("dcrit", `must be > 0 and < dmax (${dmax})`);
  }
  if (v.frame === "onset" && isNum(v.E1) && isNum(v.E2) && isNum(v.G12) && isNum(v.nu12)) {
    const isotropicG = v.E1 / (2 * (1 + v.nu12));
    const sameE = Math.abs(v.E1 - v.E2) <= ISOTROPY_TOLERANCE * Math.max(v.E1, v.E2);
    const sameG = Math.abs(v.G12 - isotropicG) <= ISOTROPY_TOLERANCE * Math.abs(isotropicG);
    if (!sameE || !sameG) {
      report(
        "frame",
        `"onset" needs an isotropic undamaged material: E1 = E2 and G12 = E1/(2(1+nu12)) ` +
          `(= ${isotropicG.toPrecision(7)}) to 1e-6 relative`,
      );
    }
  }
}

/**
 * One parameter set. Output: every field filled in (defaults of A.3); `id` stays optional
 * here because only the scenario knows the set's position.
 */
export const parameterSetSchema = fieldsSchema.superRefine(
  (value, ctx) => {
    if (typeof value !== "object" || value === null) return;
    checkCrossFieldRules(value, (field, message) =>
      ctx.addIssue({ code: "custom", path: [field], message, input: value[field] }),
    );
  },
  // Run the cross-field rules even when another field failed, so one pass reports everything.
  { when: () => true },
);

export type ParameterSetInput = z.input<typeof parameterSetSchema>;

/** The law's parameters of a parsed set, as the core takes them. */
export function toMaterialParams(set: ParameterSet): MaterialParams {
  const { id: _id, label: _label, ...params } = set;
  return params;
}
