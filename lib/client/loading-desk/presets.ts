/**
 * Invented demonstration materials. They sit in plausible windows for the material classes but
 * belong to no real product or test campaign; the labels say so.
 */
import { DEMO_SMC } from "@/lib/mechanics/demo-set";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

export interface Preset {
  key: string;
  name: string;
  note: string;
  params: Omit<ParameterSet, "id">;
}

/** Demo SMC of damage-law.md A.3 (in-plane isotropic when undamaged). */
const demoSmc: Preset = {
  key: "demo-smc",
  name: "Demo SMC (invented values)",
  note: "The demo set of the law's specification: isotropic undamaged SMC-like paste, 11 GPa.",
  params: { label: "Demo SMC (invented values)", ...DEMO_SMC },
};

/** Orthotropic injection-moulded short-glass polyamide, axis 1 along the flow. */
const demoShortGlassPa: Preset = {
  key: "demo-short-glass-pa",
  name: "Short-glass polyamide, orthotropic (invented values)",
  note: "Invented orthotropic set in the window of a dry 30 wt% short-glass polyamide; axis 1 = flow.",
  params: {
    label: "Short-glass PA, orthotropic (invented values)",
    E1: 9500,
    E2: 5200,
    nu12: 0.38,
    G12: 2100,
    Y0_1: 0.08,
    Y0_2: 0.06,
    a1: 0.25,
    a2: 0.35,
    b: 0.4,
    k6: 1.2,
    alpha: 0.004,
    beta: 0.006,
    dcrit: 0.45,
    dmax: 0.99,
    law: "sqrtY",
    frame: "fixed",
    thetaD: 0,
    Xc: 160,
    onFailure: "stop",
  },
};

export const PRESETS: readonly Preset[] = [demoSmc, demoShortGlassPa];

export function presetByKey(key: string): Preset | undefined {
  return PRESETS.find((p) => p.key === key);
}
