/**
 * Which parameters differ between two versions of a library set. Used for the set's history
 * ("what changed") and to decide whether an edit is a new version at all: a rename, or saving
 * the same numbers again, keeps the version.
 */

type Values = Record<string, unknown>;

/** The law's parameters in the order the set's page lists them; other keys follow, sorted. */
const ORDER = [
  "E1",
  "E2",
  "nu12",
  "G12",
  "Y0_1",
  "Y0_2",
  "a1",
  "a2",
  "b",
  "k6",
  "alpha",
  "beta",
  "dcrit",
  "dmax",
  "law",
  "frame",
  "thetaD",
  "Xc",
  "onFailure",
];

// The label and the id are the set's name inside a scenario file, not one of the law's parameters.
const NOT_PARAMETERS = new Set(["id", "label"]);

/** JSON with object keys sorted: PostgreSQL's jsonb does not keep the order keys came in. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(",")}]`;
  if (value !== null && typeof value === "object") {
    const entries = Object.entries(value as Values)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(",")}}`;
  }
  return JSON.stringify(value ?? null);
}

/** Equal as data, whatever the order of object keys. */
export function sameJson(a: unknown, b: unknown): boolean {
  return canonical(a) === canonical(b);
}

const sameValue = sameJson;

/** The parameter keys whose values differ, in the law's order. */
export function changedParameters(previous: object, next: object): string[] {
  const p = previous as Values;
  const n = next as Values;
  const keys = new Set([...Object.keys(p), ...Object.keys(n)]);
  const changed = [...keys].filter((k) => !NOT_PARAMETERS.has(k) && !sameValue(p[k], n[k]));
  const rank = (k: string) => {
    const i = ORDER.indexOf(k);
    return i === -1 ? ORDER.length : i;
  };
  return changed.sort((a, b) => rank(a) - rank(b) || a.localeCompare(b));
}
