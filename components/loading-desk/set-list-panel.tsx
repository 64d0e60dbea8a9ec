"use client";

import { useDrawVersion } from "@/components/charts/use-draw-version";
import { SetPicker } from "@/components/set-picker/set-picker";
import type { LibraryChoice } from "@/lib/client/sets/library-choice";
import { MAX_SETS } from "@/lib/client/loading-desk/set-colors";
import type { SetAction, SetEntry } from "@/lib/client/loading-desk/set-list";
import type { ResultsStore } from "@/lib/client/loading-desk/results-store";

export interface SetListPanelProps {
  entries: SetEntry[];
  activeId: string;
  readOnly?: boolean;
  store: ResultsStore;
  onSelect: (id: string) => void;
  dispatch: (a: SetAction) => void;
  /** Team library sets offered beside the presets. */
  library?: readonly LibraryChoice[];
}

const small =
  "rounded border border-glaze-line px-1.5 py-0.5 text-xs text-ink-soft hover:bg-glaze-deep disabled:opacity-40";

function statusOf(store: ResultsStore, id: string): string {
  const run = store.get(id);
  if (!run) return "";
  if (run.error) return "error";
  if (run.running) return "computing…";
  const s = run.buffer?.status;
  if (s?.failed)
    return `failed: ${s.failMode} at increment ${s.stoppedAtIncrement ?? run.buffer!.rows - 1}`;
  return `${(run.buffer?.rows ?? 1) - 1} increments`;
}

/** The parameter sets: colour, visibility, name, and the actions on each. */
export function SetListPanel({
  entries,
  activeId,
  readOnly,
  store,
  onSelect,
  dispatch,
  library,
}: SetListPanelProps) {
  // Re-render with the run status (computing, increments, failure) as results arrive.
  useDrawVersion(store);
  const full = entries.length >= MAX_SETS;
  return (
    <div>
      <ul className="space-y-1.5" aria-label="Parameter sets">
        {entries.map((e) => {
          const active = e.set.id === activeId;
          return (
            <li
              key={e.set.id}
              data-set={e.set.id}
              className={`rounded-md border p-2 ${active ? "border-verdigris bg-verdigris-light/40" : "border-glaze-line bg-white"}`}
            >
              <div className="flex items-center gap-2">
                <input
                  type="checkbox"
                  checked={e.visible}
                  onChange={() => dispatch({ type: "toggle", id: e.set.id })}
                  aria-label={`Show set ${e.set.id} on the charts`}
                  className="h-4 w-4"
                  style={{ accentColor: e.color }}
                />
                <span aria-hidden className="h-3 w-6 rounded-sm" style={{ background: e.color }} />
                <span className="font-mono text-xs text-ink-faint">{e.set.id}</span>
                {readOnly ? (
                  <span className="min-w-0 flex-1 truncate px-1 text-sm">{e.set.label}</span>
                ) : (
                  <input
                    value={e.set.label}
                    onChange={(ev) =>
                      dispatch({ type: "rename", id: e.set.id, label: ev.target.value })
                    }
                    aria-label={`Name of set ${e.set.id}`}
                    className="min-w-0 flex-1 truncate rounded border border-transparent bg-transparent px-1 text-sm hover:border-glaze-line focus:border-glaze-line"
                  />
                )}
              </div>
              <div className="mt-1 flex flex-wrap items-center gap-1 pl-6">
                <button
                  type="button"
                  className={small}
                  onClick={() => onSelect(e.set.id)}
                  aria-pressed={active}
                >
                  {readOnly
                    ? active
                      ? "Shown"
                      : "Show values"
                    : active
                      ? "Editing"
                      : "Edit values"}
                </button>
                {!readOnly && (
                  <>
                    <button
                      type="button"
                      className={small}
                      disabled={full}
                      onClick={() => dispatch({ type: "duplicate", id: e.set.id })}
                    >
                      Duplicate
                    </button>
                    <button
                      type="button"
                      className={small}
                      disabled={entries.length <= 1}
                      onClick={() => dispatch({ type: "remove", id: e.set.id })}
                      aria-label={`Remove set ${e.set.id}`}
                    >
                      Remove
                    </button>
                  </>
                )}
                <span className="ml-auto text-xs text-ink-faint" aria-live="polite">
                  {statusOf(store, e.set.id)}
                </span>
              </div>
            </li>
          );
        })}
      </ul>
      {!readOnly && (
        <SetPicker
          library={library}
          disabled={full}
          onAdd={(params) => dispatch({ type: "add", params })}
        />
      )}
      <p className="mt-1 text-xs text-ink-faint">
        Up to {MAX_SETS} sets. Presets are invented demonstration materials, not data of any real
        product.
      </p>
    </div>
  );
}
