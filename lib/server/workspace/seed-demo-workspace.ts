/**
 * INVENTED demo content for the demo team: the two invented parameter-set presets and one
 * scenario (tension → unload → compression on the demo SMC). Names say "invented" so nobody
 * takes them for data of a real material. Idempotent: rows already present by name are kept.
 */
import type { Db } from "@/db/client";
import { findParameterSetIdByName } from "@/db/queries/parameter-sets";
import { findScenarioIdByName } from "@/db/queries/scenarios";
import type { SignedInActor } from "@/lib/server/accounts/actor";
import { DEMO_SMC } from "@/lib/mechanics/demo-set";
import { PRESETS } from "@/lib/client/loading-desk/presets";

import { createParameterSet } from "./parameter-sets";
import { createScenario } from "./scenarios";

const SCENARIO_NAME = "Demo SMC plate — tension, unload, compression (invented)";

function demoScenarioFile() {
  return {
    format: "craquelure.scenario/1",
    name: SCENARIO_NAME,
    parameterSets: [{ id: "A", label: "Demo SMC (invented values)", ...DEMO_SMC }],
    path: {
      legs: [
        { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments: 100 },
        { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 50 },
        { control: ["strain", "stress", "stress"], target: [-0.005, 0, 0], increments: 100 },
      ],
    },
  };
}

export async function seedDemoWorkspace(
  db: Db,
  team: { id: string; slug: string },
  editor: SignedInActor,
): Promise<void> {
  for (const preset of PRESETS) {
    if (await findParameterSetIdByName(db, team.id, preset.name)) continue;
    await createParameterSet(db, editor, team.slug, {
      name: preset.name,
      values: { id: "A", ...preset.params },
      provenance: { kind: "typed", note: `${preset.note} Invented demonstration values.` },
    });
  }
  if (await findScenarioIdByName(db, team.id, SCENARIO_NAME)) return;
  await createScenario(db, editor, team.slug, {
    name: SCENARIO_NAME,
    materialLabel: "Demo SMC (invented)",
    tags: ["demo", "invented"],
    message: "Invented demo scenario: tension to 1 %, unloading to zero stress, compression.",
    file: demoScenarioFile(),
  });
}
