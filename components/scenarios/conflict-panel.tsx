"use client";

import { useQuery } from "@tanstack/react-query";
import { useMemo, useState } from "react";

import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import type { ScenarioFileJson } from "@/lib/client/loading-desk/scenario-state";
import { diffScenarios } from "@/lib/shared/revision-diff";
import { apiFetch, messageOf } from "@/lib/client/data/api-fetch";
import { teamApi } from "@/lib/client/data/api-urls";
import type { SaveConflict } from "@/lib/client/data/conflict";
import { formatWhen } from "@/lib/client/data/format";
import type { RevisionResponse } from "@/lib/client/data/types";

import { RevisionDiffView } from "./revision-diff-view";
import { SaveRevisionForm } from "./save-revision-form";

export interface ConflictPanelProps {
  slug: string;
  scenarioId: string;
  conflict: SaveConflict;
  mine: ScenarioFileJson;
  message: string;
  pending: boolean;
  error: string | null;
  onSaveOnTop: (latest: number, message: string) => void;
  onDismiss: () => void;
}

/**
 * A save that lost the race: who saved what and when, the other revision beside the user's
 * edits, and a save on top of it once reviewed. The edits stay in the loading desk throughout.
 */
export function ConflictPanel(props: ConflictPanelProps) {
  const { slug, scenarioId, conflict, mine } = props;
  const [reviewing, setReviewing] = useState(false);
  const theirs = useQuery({
    queryKey: ["team", slug, "scenarios", scenarioId, "revision-file", conflict.latest],
    queryFn: () => apiFetch<RevisionResponse>(teamApi(slug).revision(scenarioId, conflict.latest)),
    enabled: reviewing,
    staleTime: Infinity,
  });
  const diff = useMemo(() => {
    const parsedTheirs = theirs.data ? parseScenarioFile(theirs.data.file) : null;
    const parsedMine = parseScenarioFile(mine);
    if (!parsedTheirs?.ok || !parsedMine.ok) return null;
    return diffScenarios(parsedTheirs.scenario, parsedMine.scenario);
  }, [theirs.data, mine]);

  return (
    <section
      role="alert"
      aria-labelledby="conflict-title"
      className="space-y-3 rounded-lg border border-kiln/50 bg-kiln-light/60 p-4"
    >
      <h2 id="conflict-title" className="font-display text-base font-semibold text-kiln-dark">
        Revision {conflict.latest} was saved while you were editing
      </h2>
      <p className="text-sm">
        You started from revision {conflict.base}. {conflict.author} saved revision{" "}
        {conflict.latest} on {formatWhen(conflict.at)}. Nothing was overwritten and nothing of yours
        was saved; your edits are still in the loading desk below.
      </p>
      {!reviewing ? (
        <div className="flex gap-2">
          <button
            type="button"
            onClick={() => setReviewing(true)}
            className="rounded-md bg-kiln px-3 py-1.5 text-sm text-white hover:bg-kiln-dark"
          >
            Review revision {conflict.latest} beside my edits
          </button>
          <button
            type="button"
            onClick={props.onDismiss}
            className="rounded-md border border-glaze-line bg-white px-3 py-1.5 text-sm"
          >
            Keep editing
          </button>
        </div>
      ) : null}
      {reviewing && theirs.isPending ? (
        <p className="text-sm text-ink-soft">Loading revision {conflict.latest}…</p>
      ) : null}
      {reviewing && theirs.isError ? (
        <p className="text-sm text-kiln-dark">{messageOf(theirs.error)}</p>
      ) : null}
      {reviewing && theirs.data ? (
        <>
          <div className="rounded-md border border-glaze-line bg-white p-3">
            {diff ? (
              <RevisionDiffView
                diff={diff}
                fromLabel={`rev ${conflict.latest} (${conflict.author})`}
                toLabel="your edits"
              />
            ) : (
              <p className="text-sm text-ink-soft">The two files cannot be compared.</p>
            )}
          </div>
          <SaveRevisionForm
            summary={`Saves your edits as revision ${conflict.latest + 1}, on top of revision ${conflict.latest}: every value above becomes yours, where revision ${conflict.latest} differs too. Revision ${conflict.latest} stays as it is; to keep some of its values, type them into the loading desk first.`}
            submitLabel={`Save as revision ${conflict.latest + 1}`}
            pending={props.pending}
            error={props.error}
            initialMessage={props.message}
            onSubmit={(message) => props.onSaveOnTop(conflict.latest, message)}
            onCancel={props.onDismiss}
          />
        </>
      ) : null}
    </section>
  );
}
