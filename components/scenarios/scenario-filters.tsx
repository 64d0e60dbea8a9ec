"use client";

import { useState } from "react";

import type { ScenarioListState } from "@/lib/client/data/list-query";
import { REVIEW_STATE_LABELS, REVIEW_STATES } from "@/lib/client/data/review-words";

export interface ScenarioFiltersProps {
  state: ScenarioListState;
  authors: { id: string; name: string }[];
  onChange: (next: ScenarioListState) => void;
}

const SELECT = "mt-1 block rounded-md border border-glaze-line bg-white px-2 py-1.5 text-sm";

/**
 * Tag, review state and author filters; each change starts again at page 1. The parent keys this
 * by the tag in the address, so a tag picked elsewhere (a chip in the table) resets the box.
 */
export function ScenarioFilters({ state, authors, onChange }: ScenarioFiltersProps) {
  const [tag, setTag] = useState(state.tag);
  const set = (patch: Partial<ScenarioListState>) => onChange({ ...state, ...patch, page: 1 });
  return (
    <form
      className="flex flex-wrap items-end gap-3"
      role="search"
      aria-label="Filter scenarios"
      onSubmit={(e) => {
        e.preventDefault();
        set({ tag: tag.trim() });
      }}
    >
      <label className="text-sm">
        Tag
        <input
          value={tag}
          onChange={(e) => setTag(e.target.value)}
          onBlur={() => tag.trim() !== state.tag && set({ tag: tag.trim() })}
          placeholder="any tag"
          maxLength={40}
          className={`${SELECT} w-36`}
        />
      </label>
      <label className="text-sm">
        Review state
        <select
          value={state.review}
          onChange={(e) => set({ review: e.target.value as ScenarioListState["review"] })}
          className={SELECT}
        >
          <option value="">any</option>
          {REVIEW_STATES.map((s) => (
            <option key={s} value={s}>
              {REVIEW_STATE_LABELS[s]}
            </option>
          ))}
        </select>
      </label>
      <label className="text-sm">
        Author
        <select
          value={state.author}
          onChange={(e) => set({ author: e.target.value })}
          className={SELECT}
        >
          <option value="">anyone</option>
          {authors.map((a) => (
            <option key={a.id} value={a.id}>
              {a.name}
            </option>
          ))}
        </select>
      </label>
      {state.tag || state.review || state.author ? (
        <button
          type="button"
          onClick={() => set({ tag: "", review: "", author: "" })}
          className="pb-1.5 text-sm text-verdigris-dark hover:underline"
        >
          Clear filters
        </button>
      ) : null}
    </form>
  );
}
