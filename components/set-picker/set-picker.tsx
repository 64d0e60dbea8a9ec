"use client";

import { useState } from "react";

import { choiceTitle, type LibraryChoice } from "@/lib/client/sets/library-choice";
import { PRESETS } from "@/lib/client/loading-desk/presets";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

export interface SetPickerProps {
  /** The team library (or libraries, in the sandbox) beside the built-in presets. */
  library?: readonly LibraryChoice[];
  disabled?: boolean;
  onAdd: (params: Omit<ParameterSet, "id">) => void;
}

function groupsOf(library: readonly LibraryChoice[]): [string, LibraryChoice[]][] {
  const groups = new Map<string, LibraryChoice[]>();
  for (const c of library) {
    const title = c.team ? `Library of ${c.team}` : "Team library";
    groups.set(title, [...(groups.get(title) ?? []), c]);
  }
  return [...groups];
}

/** Presets and the team's library in one list; a library set shows where it came from. */
export function SetPicker({ library = [], disabled, onAdd }: SetPickerProps) {
  const [key, setKey] = useState(`preset:${PRESETS[0].key}`);
  const chosenLibrary = library.find((c) => c.key === key);
  const add = () => {
    if (chosenLibrary) return onAdd(chosenLibrary.params);
    const preset = PRESETS.find((p) => `preset:${p.key}` === key) ?? PRESETS[0];
    onAdd(preset.params);
  };
  return (
    <div className="mt-2 space-y-1">
      <div className="flex items-center gap-1">
        <label htmlFor="set-pick" className="sr-only">
          Parameter set to add
        </label>
        <select
          id="set-pick"
          value={key}
          onChange={(e) => setKey(e.target.value)}
          className="min-w-0 flex-1 rounded border border-glaze-line bg-white px-2 py-1 text-sm"
        >
          <optgroup label="Presets">
            {PRESETS.map((p) => (
              <option key={p.key} value={`preset:${p.key}`}>
                {p.name}
              </option>
            ))}
          </optgroup>
          {groupsOf(library).map(([title, items]) => (
            <optgroup key={title} label={title}>
              {items.map((c) => (
                <option key={c.key} value={c.key}>
                  {choiceTitle(c)}
                </option>
              ))}
            </optgroup>
          ))}
        </select>
        <button
          type="button"
          disabled={disabled}
          onClick={add}
          className="rounded-md bg-verdigris px-3 py-1 text-sm text-white hover:bg-verdigris-dark disabled:opacity-50"
        >
          Add set
        </button>
      </div>
      <p className="text-xs text-ink-soft" data-testid="set-pick-provenance">
        {chosenLibrary
          ? `${choiceTitle(chosenLibrary)}: ${chosenLibrary.provenance}.`
          : library.length
            ? `${library.length} set${library.length === 1 ? "" : "s"} in the library below the presets.`
            : null}
      </p>
    </div>
  );
}
