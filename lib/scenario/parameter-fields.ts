/**
 * What the loading desk form and the error messages need to know about each field of a parameter
 * set (spec damage-law.md A.3; defaults from scenario-file.md). The ranges themselves are
 * enforced in parameter-set-schema.ts; `range` here is the same rule written for people.
 */

export type ParameterKind = "number" | "choice" | "nullable-number";

export interface ParameterField {
  /** Field name in the scenario file and in code. */
  symbol: string;
  /** Unit as shown beside the input ("–" when dimensionless). */
  unit: string;
  /** One line saying what the parameter does. */
  meaning: string;
  /** Admissible range, written the way the error messages write it. */
  range: string;
  /** Default when the field is omitted; undefined means the field is required. */
  defaultValue?: number | string | null;
  kind: ParameterKind;
  /** For kind "choice": the allowed values. */
  choices?: readonly string[];
}

export const PARAMETER_FIELDS: readonly ParameterField[] = [
  {
    symbol: "E1",
    unit: "MPa",
    meaning: "Undamaged Young's modulus along damage axis 1",
    range: "> 0",
    kind: "number",
  },
  {
    symbol: "E2",
    unit: "MPa",
    meaning: "Undamaged Young's modulus along damage axis 2",
    range: "> 0",
    kind: "number",
  },
  {
    symbol: "nu12",
    unit: "–",
    meaning: "Major Poisson ratio (nu21 = nu12·E2/E1)",
    range: "|nu12| < sqrt(E1/E2)",
    kind: "number",
  },
  {
    symbol: "G12",
    unit: "MPa",
    meaning: "Undamaged in-plane shear modulus",
    range: "> 0",
    kind: "number",
  },
  {
    symbol: "Y0_1",
    unit: "MPa",
    meaning: "Damage threshold (energy release rate) of the crack family normal to axis 1",
    range: "> 0",
    kind: "number",
  },
  {
    symbol: "Y0_2",
    unit: "MPa",
    meaning: "Damage threshold (energy release rate) of the crack family normal to axis 2",
    range: "> 0",
    kind: "number",
  },
  {
    symbol: "a1",
    unit: "MPa^-0.5 (sqrtY) or MPa^-1 (linY)",
    meaning: "Slope of d1 versus sqrt(Ybar1) (or versus Ybar1 with the linY law)",
    range: "> 0 and a1·sqrt(Y0_1) < 1 (sqrtY); > 0 and 2·a1·Y0_1 < 1 (linY)",
    kind: "number",
  },
  {
    symbol: "a2",
    unit: "MPa^-0.5 (sqrtY) or MPa^-1 (linY)",
    meaning: "Slope of d2 versus sqrt(Ybar2) (or versus Ybar2 with the linY law)",
    range: "> 0 and a2·sqrt(Y0_2) < 1 (sqrtY); > 0 and 2·a2·Y0_2 < 1 (linY)",
    kind: "number",
  },
  {
    symbol: "b",
    unit: "–",
    meaning: "Coupling between the two crack families",
    range: "in [0, 1]",
    kind: "number",
  },
  {
    symbol: "k6",
    unit: "–",
    meaning: "Weight of shear traction in the crack-family compliance (1 = slit cracks)",
    range: "in [0, 3]",
    defaultValue: 1,
    kind: "number",
  },
  {
    symbol: "alpha",
    unit: "mm/mm",
    meaning: "Permanent strain per unit open damage, axis 1",
    range: "in [0, 0.05]",
    kind: "number",
  },
  {
    symbol: "beta",
    unit: "mm/mm",
    meaning: "Permanent strain per unit open damage, axis 2",
    range: "in [0, 0.05]",
    kind: "number",
  },
  {
    symbol: "dcrit",
    unit: "–",
    meaning: "Damage at which the point is flagged failed",
    range: "> 0 and < dmax",
    kind: "number",
  },
  {
    symbol: "dmax",
    unit: "–",
    meaning: "Numerical cap on damage",
    range: "in [0.9, 0.999]",
    defaultValue: 0.99,
    kind: "number",
  },
  {
    symbol: "law",
    unit: "",
    meaning: "Damage evolution: linear in sqrt(Ybar) or linear in Ybar",
    range: 'one of "sqrtY", "linY"',
    defaultValue: "sqrtY",
    kind: "choice",
    choices: ["sqrtY", "linY"],
  },
  {
    symbol: "frame",
    unit: "",
    meaning: "Damage frame: fixed at thetaD, or locked at damage onset (isotropic only)",
    range: 'one of "fixed", "onset"',
    defaultValue: "fixed",
    kind: "choice",
    choices: ["fixed", "onset"],
  },
  {
    symbol: "thetaD",
    unit: "deg",
    meaning: "Angle from the load frame to damage axis 1, counter-clockwise",
    range: "a finite number",
    defaultValue: 0,
    kind: "number",
  },
  {
    symbol: "Xc",
    unit: "MPa",
    meaning: "Compressive strength: flags a warning only; null switches it off",
    range: "> 0 or null",
    defaultValue: null,
    kind: "nullable-number",
  },
  {
    symbol: "onFailure",
    unit: "",
    meaning: "At dcrit: end the path, or cap the damage at dmax and go on",
    range: 'one of "stop", "continue"',
    defaultValue: "stop",
    kind: "choice",
    choices: ["stop", "continue"],
  },
];

/** The range text of one field, for messages. */
export function rangeOf(symbol: string): string {
  const field = PARAMETER_FIELDS.find((f) => f.symbol === symbol);
  if (!field) throw new Error(`no parameter field ${symbol}`);
  return field.range;
}
