/**
 * The component names of the notation. The product writes the symbols ε11, ε22, γ12 (a strain,
 * γ12 engineering shear) and σ11, σ22, σ12 (a stress); keyboards without Greek type the words
 * strain11, strain22, shear12, stress11, stress22, stress12. The names of version 1 (e11, e22,
 * g12, s11, s22, s12) still parse, so texts saved in earlier revisions open. Index = Voigt
 * position (11, 22, 12).
 */
import type { ControlKind } from "@/lib/mechanics/types";

export interface ComponentName {
  index: 0 | 1 | 2;
  control: ControlKind;
}

const strain = (index: 0 | 1 | 2): ComponentName => ({ index, control: "strain" });
const stress = (index: 0 | 1 | 2): ComponentName => ({ index, control: "stress" });

/** What the product writes and the words it accepts for it. */
const CURRENT_COMPONENT_NAMES: Readonly<Record<string, ComponentName>> = {
  ε11: strain(0),
  ε22: strain(1),
  γ12: strain(2),
  σ11: stress(0),
  σ22: stress(1),
  σ12: stress(2),
  τ12: stress(2),
  strain11: strain(0),
  strain22: strain(1),
  shear12: strain(2),
  stress11: stress(0),
  stress22: stress(1),
  stress12: stress(2),
};

/** Version-1 names, read and rewritten to the symbols (see `pathTextInCurrentWords`). */
export const VERSION1_COMPONENT_NAMES: Readonly<Record<string, ComponentName>> = {
  e11: strain(0),
  e22: strain(1),
  g12: strain(2),
  s11: stress(0),
  s22: stress(1),
  s12: stress(2),
};

export const COMPONENT_NAMES: Readonly<Record<string, ComponentName>> = {
  ...CURRENT_COMPONENT_NAMES,
  ...VERSION1_COMPONENT_NAMES,
};

/** The word before a leg's increment count; version 1 wrote "in". */
export const INCREMENTS_WORD = "over";
export const VERSION1_INCREMENTS_WORD = "in";

/** The notation's symbol of a component, e.g. (2, "strain") → "γ12". */
export function componentName(index: 0 | 1 | 2, control: ControlKind): string {
  const suffix = ["11", "22", "12"][index];
  if (control === "stress") return `σ${suffix}`;
  return index === 2 ? "γ12" : `ε${suffix}`;
}

/** A hint for a word that is not a component name. */
export function componentHint(word: string): string {
  if (/^(e12|ε12|strain12)$/i.test(word))
    return 'use "γ12" or "shear12" (engineering shear strain, γ12 = 2·ε12)';
  const lower = word.toLowerCase();
  if (lower !== word && COMPONENT_NAMES[lower]) return `write it in lower case: "${lower}"`;
  return "use ε11, ε22, γ12 (or strain11, strain22, shear12) for a strain, σ11, σ22, σ12 (or stress11, stress22, stress12) for a stress";
}
