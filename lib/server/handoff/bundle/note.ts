import "server-only";

/** The plain-text note of a reference bundle: what is in it, columns, units, tolerance, caution. */
import { DEFAULT_TOLERANCE } from "@/lib/server/handoff/conformance/types";
import { RESULT_COLUMNS } from "@/lib/mechanics/types";

import { CAUTION_LINES } from "../../../shared/caution";
import type { LoadCase } from "./load-cases";

export interface BundleIdentity {
  team: string;
  scenario: string;
  revision: number;
  reviewState: string;
  createdAt: string;
  generatedAt: string;
}

export function bundleNote(id: BundleIdentity, cases: Map<string, LoadCase[]>): string {
  const lines = [
    "CRAQUELURE REFERENCE BUNDLE",
    "",
    `Team: ${id.team}`,
    `Scenario: ${id.scenario}, revision ${id.revision} (saved ${id.createdAt}, review state: ${id.reviewState})`,
    `Generated: ${id.generatedAt}`,
    "",
    "CAUTION",
    ...CAUTION_LINES,
    "",
    "CONTENTS",
    "scenario.json                  the revision's scenario file (craquelure.scenario/1)",
    "cases/<set>/<case>.json        each load case as a scenario file with that one parameter set",
    "curves/<set>/<case>.csv        Craquelure's answer to that case at one material point",
    "",
    "Reproduce a curve with: npm run --silent drive -- cases/<set>/<case>.json > out.csv",
    "",
    "LOAD CASES (strain levels scale with each set's onset strain sqrt(2*Y0/E))",
    ...[...cases].flatMap(([set, list]) => [
      `set ${set}:`,
      ...list.map(
        (c) =>
          `  ${c.id.padEnd(30)} ${c.title}; ${c.legs.length} leg(s), ${c.legs.reduce((n, l) => n + l.increments, 0)} increments`,
      ),
    ]),
    "",
    "COLUMNS (one row per increment; row 0 is the initial state)",
    RESULT_COLUMNS.join(","),
    "increment: increment number from 0; leg: 1-based leg (0 on row 0)",
    "eps11, eps22, gam12: load-frame strains ε11, ε22, γ12 in mm/mm, γ12 the engineering shear strain (2·ε12)",
    "sig11, sig22, sig12: load-frame stresses σ11, σ22, σ12 in MPa",
    "d1, d2: damage variables; dp1, dp2: their permanent-strain drivers",
    "epsP11, epsP22, gamP12: permanent (residual) strains in mm/mm",
    "Y1, Y2, Ybar1, Ybar2: damage energy release rates in the damage frame, MPa",
    "psi: stored energy, W: work in, Phi: dissipated energy, all per unit volume in MPa",
    "thetaD: damage frame angle in degrees; failed: 0 or 1",
    "Numbers are written in shortest round-trip form (full double precision).",
    "",
    "TOLERANCE FOR A CONFORMANCE CHECK",
    `Stresses: ${DEFAULT_TOLERANCE.stressFraction * 100} % of the peak stress magnitude of the case.`,
    `Damage d1, d2: ${DEFAULT_TOLERANCE.damage} absolute.`,
    "Upload your implementation's single-point history (increment, eps11, eps22, gam12, sig11, sig22,",
    "sig12, optionally d1, d2) on the revision's conformance page; its strains are replayed and compared.",
    "",
  ];
  return lines.join("\n");
}
