/**
 * Unit and range of a parameter as shown beside its input, for the law in use: the field list
 * writes both laws' variants ("… (sqrtY) or … (linY)"); the form shows only the one that applies.
 */
import type { ParameterField } from "@/lib/scenario/parameter-fields";

function pickVariant(text: string, law: string, separator: RegExp): string {
  const parts = text.split(separator).map((p) => p.trim());
  if (parts.length < 2) return text;
  const hit = parts.find((p) => p.includes(`(${law})`));
  return (hit ?? parts[0]).replace(/\s*\((sqrtY|linY)\)\s*$/, "");
}

export function unitFor(f: ParameterField, law: string): string {
  return pickVariant(f.unit, law, / or /);
}

export function rangeFor(f: ParameterField, law: string): string {
  return pickVariant(f.range, law, /;/);
}
