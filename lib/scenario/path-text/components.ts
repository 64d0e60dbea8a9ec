/**
 * The component names of the notation: e11, e22, g12 prescribe a strain (g12 engineering
 * shear), s11, s22, s12 a stress. Index = Voigt position (11, 22, 12).
 */
import type { ControlKind } from "@/lib/mechanics/types";

export interface ComponentName {
  index: 0 | 1 | 2;
  control: ControlKind;
}

export const COMPONENT_NAMES: Record<string, ComponentName> = {
  e11: { index: 0, control: "strain" },
  e22: { index: 1, control: "strain" },
  g12: { index: 2, control: "strain" },
  s11: { index: 0, control: "stress" },
  s22: { index: 1, control: "stress" },
  s12: { index: 2, control: "stress" },
};

/** The notation's name of a component, e.g. (2, "strain") → "g12". */
export function componentName(index: 0 | 1 | 2, control: ControlKind): string {
  const suffix = ["11", "22", "12"][index];
  if (control === "stress") return `s${suffix}`;
  return index === 2 ? "g12" : `e${suffix}`;
}

/** A hint for a word that is not a component name. */
export function componentHint(word: string): string {
  if (/^e12$/i.test(word)) return 'use "g12" (engineering shear strain, g12 = 2·e12)';
  if (/^[esg](11|22|12)$/i.test(word) && word !== word.toLowerCase())
    return `write it in lower case: "${word.toLowerCase()}"`;
  return "use e11, e22, g12 for a strain or s11, s22, s12 for a stress";
}
