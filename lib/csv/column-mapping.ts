/**
 * A first guess of which column is which, from English header names (units stripped). The user
 * confirms or corrects it in the mapping step; the guess never decides silently.
 */
import { findTrailingUnit } from "./trailing-unit";
import { forceUnitFromHeader, lengthUnitFromHeader } from "./units";

export const CHANNELS = [
  "strain",
  "stress",
  "time",
  "transverseStrain",
  "shearStrain",
  "shearStress",
] as const;
export type Channel = (typeof CHANNELS)[number];
export type ColumnMapping = Partial<Record<Channel, number>>;

// Most specific first: "shear strain" must not be taken for the axial strain. The symbols
// (ε22, σ12) are what the loading desk's own results CSV writes.
const PATTERNS: [Channel, RegExp][] = [
  ["shearStrain", /shear.*strain|gamma|γ|gam(12)?\b|strain.*12|e12/],
  ["shearStress", /shear.*stress|tau|τ|sig(ma)?.*12|σ.*12|s12/],
  [
    "transverseStrain",
    /(transverse|lateral|width).*strain|strain.*(transverse|lateral|22|yy)|(eps|ε).*(22|yy)|e22/,
  ],
  ["time", /^(time|t|elapsed|sec|seconds)\b|time/],
  ["strain", /strain|eps|ε|elongation|extension/],
  ["stress", /stress|sigma|σ|force\s*\/\s*area|sig|load\s*\/\s*area/],
];

/** Header text without its unit and decoration, lower case. */
export function headerName(header: string): string {
  const unit = findTrailingUnit(header);
  const bare = unit === null ? header : header.slice(0, unit.open);
  return bare.trim().toLowerCase();
}

export type Quantity = Channel | "force" | "extension";
export type QuantityMapping = Partial<Record<Quantity, number>>;

const FORCE_NAME = /force|load/;
const EXTENSION_NAME = /extension|displacement|elongation|crosshead|stroke|travel/;

/**
 * Like suggestMapping, and a machine's force and extension columns too: a force unit (N, kN) or
 * a force name without another unit; a length unit (mm, µm) or an extension name without one.
 */
export function suggestQuantities(headers: string[], hasHeader: boolean): QuantityMapping {
  if (!hasHeader) return suggestMapping(headers, hasHeader);
  const unitless = (h: string) => findTrailingUnit(h) === null;
  const force = headers.findIndex(
    (h) => forceUnitFromHeader(h) !== null || (unitless(h) && FORCE_NAME.test(headerName(h))),
  );
  const extension = headers.findIndex(
    (h, i) =>
      i !== force &&
      (lengthUnitFromHeader(h) !== null || (unitless(h) && EXTENSION_NAME.test(headerName(h)))),
  );
  const taken = new Set([force, extension].filter((i) => i >= 0));
  const rest = suggestMapping(
    headers.map((h, i) => (taken.has(i) ? "" : h)),
    hasHeader,
  );
  const mapping: QuantityMapping = { ...rest };
  if (force >= 0) mapping.force = force;
  if (extension >= 0) mapping.extension = extension;
  return mapping;
}

export function suggestMapping(headers: string[], hasHeader: boolean): ColumnMapping {
  const mapping: ColumnMapping = {};
  if (!hasHeader) {
    // Without names the usual order of a coupon export is strain, stress.
    if (headers.length >= 2) Object.assign(mapping, { strain: 0, stress: 1 });
    return mapping;
  }
  const taken = new Set<number>();
  for (const [channel, pattern] of PATTERNS) {
    const index = headers.findIndex((h, i) => !taken.has(i) && pattern.test(headerName(h)));
    if (index >= 0) {
      mapping[channel] = index;
      taken.add(index);
    }
  }
  return mapping;
}
