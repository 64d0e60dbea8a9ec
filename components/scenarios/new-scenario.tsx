"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { LoadingDesk } from "@/components/loading-desk/loading-desk";
import { checkScenario } from "@/lib/client/sets/check-scenario";
import { defaultScenario } from "@/lib/client/loading-desk/default-scenario";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import type { ScenarioFileJson } from "@/lib/client/loading-desk/scenario-state";
import { messageOf } from "@/lib/client/data/api-fetch";
import { useLibraryChoices } from "@/lib/client/data/use-library-choices";
import { teamPages } from "@/lib/client/data/api-urls";
import { parseTags } from "@/lib/client/data/tags";
import { useCreateScenario } from "@/lib/client/data/use-save-revision";

import { SaveRevisionForm } from "./save-revision-form";

export interface NewScenarioProps {
  slug: string;
  /** A library set to check ("Check in a new scenario" on a fit's page). */
  checkSet?: { name: string; values: object };
}

const INPUT = "mt-1 block w-full rounded-md border border-glaze-line bg-white px-3 py-1.5 text-sm";

function starter(checkSet: NewScenarioProps["checkSet"]): ScenarioFileJson {
  if (checkSet) {
    const { id: _id, ...values } = checkSet.values as Record<string, unknown>;
    return checkScenario({ ...values, label: checkSet.name } as Omit<ParameterSet, "id">);
  }
  return { ...defaultScenario(), name: "New scenario" };
}

/** The loading desk on the starting template; saving creates the scenario with revision 1. */
export function NewScenario({ slug, checkSet }: NewScenarioProps) {
  const router = useRouter();
  const create = useCreateScenario(slug);
  const library = useLibraryChoices(slug);
  const [initial] = useState(() => starter(checkSet));
  const [material, setMaterial] = useState("");
  const [tags, setTags] = useState("");
  const [pending, setPending] = useState<ScenarioFileJson | null>(null);
  const [error, setError] = useState<string | null>(null);

  const submit = (message: string) => {
    if (!pending) return;
    const name = pending.name.trim();
    if (!name) return setError("Give the scenario a name (the title above the loading desk).");
    setError(null);
    create.mutate(
      { name, materialLabel: material.trim(), tags: parseTags(tags), message, file: pending },
      {
        onSuccess: (data) => router.push(teamPages(slug).scenario(data.scenario.id)),
        onError: (e) => setError(messageOf(e)),
      },
    );
  };

  return (
    <div className="space-y-3">
      <div className="mx-auto grid max-w-[1600px] gap-3 px-4 sm:grid-cols-2">
        <label className="text-sm font-medium">
          Material
          <input
            value={material}
            maxLength={200}
            onChange={(e) => setMaterial(e.target.value)}
            placeholder="e.g. SMC, 30 % glass, 3 mm plate"
            className={INPUT}
          />
        </label>
        <label className="text-sm font-medium">
          Tags (separated by commas)
          <input
            value={tags}
            onChange={(e) => setTags(e.target.value)}
            placeholder="e.g. crash, 23 °C"
            className={INPUT}
          />
        </label>
      </div>
      {pending ? (
        <div className="mx-auto max-w-[1600px] px-4">
          <SaveRevisionForm
            summary={`Creates the scenario “${pending.name.trim() || "(no name)"}” with revision 1.`}
            submitLabel="Save revision 1"
            pending={create.isPending}
            error={error}
            initialMessage="First revision"
            onSubmit={submit}
            onCancel={() => setPending(null)}
          />
        </div>
      ) : null}
      <LoadingDesk library={library} initialScenario={initial} onSave={(f) => setPending(f)} />
    </div>
  );
}
