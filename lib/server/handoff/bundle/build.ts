import "server-only";

/** Builds the reference bundle zip of one revision: pure apart from the zip library. */
import JSZip from "jszip";

import { runPath } from "@/lib/mechanics/driver";
import { toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import { resultsToCsv } from "@/lib/scenario/results-csv";
import { SCENARIO_FORMAT, type Scenario } from "@/lib/scenario/scenario-schema";

import { standardLoadCases, type LoadCase } from "./load-cases";
import { bundleNote, type BundleIdentity } from "./note";

/** Set ids may hold characters a path should not: keep letters, digits, dot, dash, underscore. */
export const safeName = (id: string) => id.replace(/[^A-Za-z0-9._-]/g, "_") || "_";

export async function buildReferenceBundle(
  file: Record<string, unknown>,
  scenario: Scenario,
  identity: BundleIdentity,
): Promise<Uint8Array> {
  const zip = new JSZip();
  const root = zip.folder("reference-bundle")!;
  root.file("scenario.json", JSON.stringify(file, null, 2) + "\n");
  const cases = new Map<string, LoadCase[]>();
  for (const set of scenario.parameterSets) {
    const list = standardLoadCases(set);
    cases.set(set.id, list);
    const dir = safeName(set.id);
    for (const c of list) {
      const caseFile = {
        format: SCENARIO_FORMAT,
        name: `${scenario.name} — ${c.title}, set ${set.id}`,
        parameterSets: [set],
        path: { legs: c.legs },
      };
      root.file(`cases/${dir}/${c.id}.json`, JSON.stringify(caseFile, null, 2) + "\n");
      const run = runPath(toMaterialParams(set), c.legs);
      root.file(`curves/${dir}/${c.id}.csv`, resultsToCsv(run.columns, run.rows));
    }
  }
  root.file("README.txt", bundleNote(identity, cases));
  return zip.generateAsync({ type: "uint8array", compression: "DEFLATE" });
}
