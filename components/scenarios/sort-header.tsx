import type { ScenarioListState } from "@/lib/client/data/list-query";

export interface SortHeaderProps {
  label: string;
  column: ScenarioListState["sort"];
  state: ScenarioListState;
  onSort: (column: ScenarioListState["sort"]) => void;
}

/** A column heading that sorts; aria-sort tells which way it is sorted now. */
export function SortHeader({ label, column, state, onSort }: SortHeaderProps) {
  const active = state.sort === column;
  const sortWord = state.dir === "asc" ? "ascending" : "descending";
  return (
    <th className="px-3 py-2 font-medium" aria-sort={active ? sortWord : "none"}>
      <button
        type="button"
        onClick={() => onSort(column)}
        className="inline-flex items-center gap-1 hover:text-ink"
      >
        {label}
        <span aria-hidden className={active ? "text-ink" : "text-ink-faint/50"}>
          {active ? (state.dir === "asc" ? "▲" : "▼") : "↕"}
        </span>
      </button>
    </th>
  );
}
