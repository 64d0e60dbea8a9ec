"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { messageOf } from "@/lib/client/data/api-fetch";
import { teamPages } from "@/lib/client/data/api-urls";
import { parseTags } from "@/lib/client/data/tags";
import { useDeleteScenario, useUpdateScenario } from "@/lib/client/data/use-scenario-details";

export interface ScenarioDetailsEditorProps {
  slug: string;
  scenarioId: string;
  name: string;
  materialLabel: string;
  tags: string[];
  revisions: number;
}

const INPUT = "mt-1 block w-full rounded-md border border-glaze-line bg-white px-2 py-1 text-sm";

/** Name, material and tags of the scenario (not of a revision), and deleting it, for editors. */
export function ScenarioDetailsEditor(props: ScenarioDetailsEditorProps) {
  const router = useRouter();
  const update = useUpdateScenario(props.slug, props.scenarioId);
  const remove = useDeleteScenario(props.slug, props.scenarioId);
  const [open, setOpen] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const [name, setName] = useState(props.name);
  const [material, setMaterial] = useState(props.materialLabel);
  const [tags, setTags] = useState(props.tags.join(", "));

  if (!open)
    return (
      <button
        type="button"
        onClick={() => setOpen(true)}
        className="mb-3 text-sm text-verdigris-dark hover:underline"
      >
        Edit name, material and tags
      </button>
    );
  return (
    <form
      className="mb-4 space-y-3 rounded-lg border border-glaze-line bg-white/70 p-3 text-sm"
      onSubmit={(e) => {
        e.preventDefault();
        update.mutate(
          { name: name.trim(), materialLabel: material.trim(), tags: parseTags(tags) },
          {
            onSuccess: () => {
              setOpen(false);
              router.refresh();
            },
          },
        );
      }}
    >
      <div className="grid gap-3 sm:grid-cols-3">
        <label className="font-medium">
          Scenario name
          <input
            value={name}
            maxLength={200}
            onChange={(e) => setName(e.target.value)}
            className={INPUT}
          />
        </label>
        <label className="font-medium">
          Material
          <input
            value={material}
            maxLength={200}
            onChange={(e) => setMaterial(e.target.value)}
            className={INPUT}
          />
        </label>
        <label className="font-medium">
          Tags (separated by commas)
          <input value={tags} onChange={(e) => setTags(e.target.value)} className={INPUT} />
        </label>
      </div>
      {update.isError ? (
        <p role="alert" className="text-kiln-dark">
          {messageOf(update.error)}
        </p>
      ) : null}
      <div className="flex flex-wrap items-center gap-3">
        <button
          type="submit"
          disabled={update.isPending || !name.trim()}
          className="rounded-md bg-verdigris px-3 py-1.5 text-white hover:bg-verdigris-dark disabled:opacity-60"
        >
          Save details
        </button>
        <button
          type="button"
          onClick={() => setOpen(false)}
          className="text-ink-soft hover:underline"
        >
          Cancel
        </button>
        <span className="ml-auto">
          {confirming ? (
            <span className="inline-flex flex-wrap items-center gap-2">
              <span className="text-kiln-dark">
                Delete the scenario with its {props.revisions} revision
                {props.revisions === 1 ? "" : "s"}, comments, reviews and share links?
              </span>
              <button
                type="button"
                disabled={remove.isPending}
                onClick={() =>
                  remove.mutate(undefined, {
                    onSuccess: () => router.push(teamPages(props.slug).scenarios),
                  })
                }
                className="rounded-md bg-kiln px-2 py-1 text-white hover:bg-kiln-dark"
              >
                Delete for good
              </button>
              <button type="button" onClick={() => setConfirming(false)} className="text-ink-soft">
                Keep it
              </button>
            </span>
          ) : (
            <button
              type="button"
              onClick={() => setConfirming(true)}
              className="text-kiln-dark hover:underline"
            >
              Delete scenario…
            </button>
          )}
        </span>
      </div>
      {remove.isError ? (
        <p role="alert" className="text-kiln-dark">
          {messageOf(remove.error)}
        </p>
      ) : null}
    </form>
  );
}
