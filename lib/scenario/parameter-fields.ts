/**
 * What the loading desk form and the error messages need to know about each field of a parameter
 * set (spec damage-law.md A.3; defaults from scenario-file.md). The ranges themselves are
 * enforced in parameter-set-schema.ts; `range` here is the same rule written for people.
 */

export type ParameterKind = "number" | "choice" | "nullable-number";

export interface ParameterField {
  /** Field name in the scenario file and in code; the symbol people see beside the words. */
  symbol: string;
  /** What the parameter is, in a few plain words (shown with the symbol in forms and messages). */
  label: string;
  /** Unit, typeset, as shown beside the input ("–" when dimensionless, "" for a choice). */
  unit: string;
  /** Units that depend on the growth law (the slopes a1, a2); `unit` is then the sqrtY one. */
  unitByLaw?: Readonly<Record<GrowthLaw, string>>;
  /** One line saying what the parameter does. */
  meaning: string;
  /** Admissible range, written the way the error messages write it. */
  range: string;
  /** Default when the field is omitted; undefined means the field is required. */
  defaultValue?: number | string | null;
  kind: ParameterKind;
  /** For kind "choice": the allowed values (as the file writes them). */
  choices?: readonly string[];
  /** For kind "choice": each value in words. */
  choiceWords?: Readonly<Record<string, string>>;
}

export type GrowthLaw = "sqrtY" | "linY";

// The slopes a1, a2 relate d to sqrt(Y) or to Y (A.3), so their unit follows the law.
const SLOPE_UNITS = { sqrtY: "MPa⁻⁰·⁵", linY: "MPa⁻¹" } as const;

/** The unit of √Y (Y in MPa), written in the same typeset form as the slopes' units. */
export const SQRT_Y_UNIT = "MPa⁰·⁵";

export const PARAMETER_FIELDS: readonly ParameterField[] = [
  {
    symbol: "E1",
    label: "Young's modulus, axis 1",
    unit: "MPa",
    meaning: "Undamaged Young's modulus along damage axis 1",
    range: "> 0",
    kind: "number",
  },
  {
    symbol: "E2",
    label: "Young's modulus, axis 2",
    unit: "MPa",
    meaning: "Undamaged Young's modulus along damage axis 2",
    range: "> 0",
    kind: "number",
  },
  {
    symbol: "nu12",
    label: "Poisson ratio",
    unit: "–",
    meaning: "Major Poisson ratio (ν21 = ν12·E2/E1)",
    range: "|nu12| < √(E1/E2)",
    kind: "number",
  },
  {
    symbol: "G12",
    label: "shear modulus",
    unit: "MPa",
    meaning: "Undamaged in-plane shear modulus",
    range: "> 0",
    kind: "number",
  },
  {
    symbol: "Y0_1",
    label: "damage threshold, axis 1",
    unit: "MPa",
    meaning: "Damage threshold (energy release rate) of the crack family normal to axis 1",
    range: "> 0",
    kind: "number",
  },
  {
    symbol: "Y0_2",
    label: "damage threshold, axis 2",
    unit: "MPa",
    meaning: "Damage threshold (energy release rate) of the crack family normal to axis 2",
    range: "> 0",
    kind: "number",
  },
  {
    symbol: "a1",
    label: "damage growth slope, axis 1",
    unit: SLOPE_UNITS.sqrtY,
    unitByLaw: SLOPE_UNITS,
    meaning: "Slope of d1 versus √Ȳ1 (or versus Ȳ1 with the law linear in Ȳ)",
    range: "> 0 and a1·√Y0_1 < 1 (sqrtY); > 0 and 2·a1·Y0_1 < 1 (linY)",
    kind: "number",
  },
  {
    symbol: "a2",
    label: "damage growth slope, axis 2",
    unit: SLOPE_UNITS.sqrtY,
    unitByLaw: SLOPE_UNITS,
    meaning: "Slope of d2 versus √Ȳ2 (or versus Ȳ2 with the law linear in Ȳ)",
    range: "> 0 and a2·√Y0_2 < 1 (sqrtY); > 0 and 2·a2·Y0_2 < 1 (linY)",
    kind: "number",
  },
  {
    symbol: "b",
    label: "coupling of the crack families",
    unit: "–",
    meaning: "Coupling between the two crack families",
    range: "in [0, 1]",
    kind: "number",
  },
  {
    symbol: "k6",
    label: "shear weight in crack compliance",
    unit: "–",
    meaning: "Weight of shear traction in the crack-family compliance (1 = slit cracks)",
    range: "in [0, 3]",
    defaultValue: 1,
    kind: "number",
  },
  {
    symbol: "alpha",
    label: "permanent strain factor, axis 1",
    unit: "mm/mm",
    meaning: "Permanent strain per unit open damage, axis 1",
    range: "in [0, 0.05]",
    kind: "number",
  },
  {
    symbol: "beta",
    label: "permanent strain factor, axis 2",
    unit: "mm/mm",
    meaning: "Permanent strain per unit open damage, axis 2",
    range: "in [0, 0.05]",
    kind: "number",
  },
  {
    symbol: "dcrit",
    label: "critical damage",
    unit: "–",
    meaning: "Damage at which the point is flagged failed",
    range: "> 0 and < dmax",
    kind: "number",
  },
  {
    symbol: "dmax",
    label: "damage cap",
    unit: "–",
    meaning: "Numerical cap on damage",
    range: "in [0.9, 0.999]",
    defaultValue: 0.99,
    kind: "number",
  },
  {
    symbol: "law",
    label: "damage growth law",
    unit: "",
    meaning: "Damage evolution: linear in √Ȳ or linear in Ȳ",
    range: 'd linear in √Ȳ ("sqrtY") or linear in Ȳ ("linY")',
    defaultValue: "sqrtY",
    kind: "choice",
    choices: ["sqrtY", "linY"],
    choiceWords: { sqrtY: "d linear in √Ȳ", linY: "d linear in Ȳ" },
  },
  {
    symbol: "frame",
    label: "damage frame",
    unit: "",
    meaning:
      "Damage frame: fixed at the damage axis angle θD, or locked at damage onset (isotropic only)",
    range: 'fixed at the damage axis angle ("fixed") or locked at onset ("onset")',
    defaultValue: "fixed",
    kind: "choice",
    choices: ["fixed", "onset"],
    choiceWords: { fixed: "fixed at the damage axis angle", onset: "locked at damage onset" },
  },
  {
    symbol: "thetaD",
    label: "damage axis angle",
    unit: "°",
    meaning: "Angle from the load frame to damage axis 1, counter-clockwise",
    range: "a finite number",
    defaultValue: 0,
    kind: "number",
  },
  {
    symbol: "Xc",
    label: "compressive strength",
    unit: "MPa",
    meaning: "Compressive strength: flags a warning only; null switches it off",
    range: "> 0 or null",
    defaultValue: null,
    kind: "nullable-number",
  },
  {
    symbol: "onFailure",
    label: "at critical damage",
    unit: "",
    meaning: "At the critical damage dcrit: end the path, or cap the damage at dmax and go on",
    range: 'end the path ("stop") or cap the damage and go on ("continue")',
    defaultValue: "stop",
    kind: "choice",
    choices: ["stop", "continue"],
    choiceWords: { stop: "end the path", continue: "cap the damage at dmax and go on" },
  },
];

/** The range text of one field, for messages. */
export function rangeOf(symbol: string): string {
  return fieldOf(symbol).range;
}

function fieldOf(symbol: string): ParameterField {
  const field = PARAMETER_FIELDS.find((f) => f.symbol === symbol);
  if (!field) throw new Error(`no parameter field ${symbol}`);
  return field;
}

/** The unit of a field for the law in use (only the slopes differ between laws). */
export function unitOf(field: ParameterField, law: unknown): string {
  if (!field.unitByLaw) return field.unit;
  return law === "linY" ? field.unitByLaw.linY : field.unitByLaw.sqrtY;
}

/** "k6 (shear weight in crack compliance)": the symbol kept, its meaning said. */
export function labelOf(symbol: string): string {
  const field = PARAMETER_FIELDS.find((f) => f.symbol === symbol);
  return field ? `${field.symbol} (${field.label})` : symbol;
}

/** A choice value in words with the file's word beside it: "end the path (stop)". */
export function choiceText(field: ParameterField, value: string): string {
  const words = field.choiceWords?.[value];
  return words ? `${words} (${value})` : value;
}
