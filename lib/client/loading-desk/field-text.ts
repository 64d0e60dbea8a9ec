/**
 * Unit and range of a parameter as shown beside its input, for the law in use: the field list
 * writes both laws' range variants ("… (sqrtY); … (linY)"); the form shows only the one that applies.
 */
import { type ParameterField, unitOf } from "@/lib/scenario/parameter-fields";

function pickVariant(text: string, law: string, separator: RegExp): string {
  const parts = text.split(separator).map((p) => p.trim());
  if (parts.length < 2) return text;
  const hit = parts.find((p) => p.includes(`(${law})`));
  return (hit ?? parts[0]).replace(/\s*\((sqrtY|linY)\)\s*$/, "");
}

/** The unit beside the input; empty when dimensionless or a choice. */
export function unitFor(f: ParameterField, law: string): string {
  const unit = unitOf(f, law);
  return unit === "–" ? "" : unit;
}

export function rangeFor(f: ParameterField, law: string): string {
  return pickVariant(f.range, law, /;/);
}
