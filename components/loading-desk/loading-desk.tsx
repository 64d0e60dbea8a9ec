"use client";

import Link from "next/link";
import { useCallback, useEffect, useMemo, useReducer, useState } from "react";
import { Panel } from "@/components/ui/panel";
import { expandPathDoc } from "@/lib/scenario/path-text/path-doc";
import { toMaterialParams, type ParameterSet } from "@/lib/scenario/parameter-set-schema";
import type { LibraryChoice } from "@/lib/client/sets/library-choice";
import type { ChartOverlay } from "@/lib/client/loading-desk/chart-overlays";
import type { DeskOverlay } from "@/lib/scenario/desk-extras";
import {
  fromScenario,
  type OpenedScenario,
  type ScenarioFileJson,
  toScenarioFile,
} from "@/lib/client/loading-desk/scenario-state";
import { encodeState, URL_STATE_KEY } from "@/lib/client/loading-desk/url-state";
import { initModel, loadingDeskReducer } from "@/lib/client/loading-desk/loading-desk-reducer";
import { AboutLaw } from "./about-law";
import { ChartGrid } from "./chart-grid";
import { ExportPanel } from "./export-panel";
import { MeaningsPanel } from "./meanings-panel";
import { ParameterForm } from "./parameter-form";
import { ReadOnlyBanner } from "./read-only-banner";
import { PathEditor } from "./path-editor";
import { ResultsTable } from "./results-table";
import { RunErrors } from "./run-errors";
import { SetDiffTable } from "./set-diff-table";
import { SetListPanel } from "./set-list-panel";
import { UnsavedMark } from "./unsaved-mark";
import { useSolverRuns } from "./use-solver-runs";
import { useUrlSync } from "./use-url-sync";

export interface LoadingDeskProps {
  /**
   * The scenario to open, validated (parseScenarioFile): the sandbox default, a link, a saved
   * revision. Its top-level "desk" field (files written before the rename: "workbench"), if present, restores the path text, hidden sets,
   * test records and chart choices.
   */
  initialScenario: OpenedScenario;
  readOnly?: boolean;
  /** The team named in the read-only banner (who may edit). */
  teamName?: string;
  /** Saving a revision; without it the save button asks to sign in. */
  onSave?: (file: ScenarioFileJson) => void | Promise<void>;
  /** The save button's words ("Save revision" unless told). */
  saveLabel?: string;
  /** Called with the scenario file just before "Sign in to save" leaves the page. */
  onSignIn?: (file: ScenarioFileJson) => void;
  /** Keep the state in the address so it can be sent as a link (the sandbox). */
  syncUrl?: boolean;
  /** Measured curves drawn over the chart whose axes they match (test records). */
  overlays?: readonly ChartOverlay[];
  /**
   * Which test records are drawn, when the page around the desk chooses them (the scenario
   * editor); saved in the file's desk field. Without it the opened file's choice is kept as is.
   */
  overlayChoice?: readonly DeskOverlay[];
  /** Team library sets the set picker offers beside the presets. */
  library?: readonly LibraryChoice[];
  /** "revision 4" when a saved revision is open; stamped on exports. Null on scratch data. */
  revision?: string | null;
  /** The desk differs from the saved revision: shows the unsaved mark beside the save button. */
  unsaved?: boolean;
  /** Called with the scenario file after every change (and once on opening). */
  onFileChange?: (file: ScenarioFileJson) => void;
}

export function LoadingDesk({
  initialScenario,
  readOnly,
  teamName,
  onSave,
  saveLabel = "Save revision",
  onSignIn,
  syncUrl,
  overlays,
  overlayChoice,
  library,
  revision = null,
  unsaved,
  onFileChange,
}: LoadingDeskProps) {
  const [m, dispatch] = useReducer(loadingDeskReducer, initialScenario, (s) =>
    initModel(fromScenario(s)),
  );
  const [linkNote, setLinkNote] = useState("");
  const legs = useMemo(() => (m.doc.items.length ? expandPathDoc(m.doc) : null), [m.doc]);
  const store = useSolverRuns(m.entries, legs);
  const file = useMemo(
    () => toScenarioFile(overlayChoice ? { ...m, overlays: [...overlayChoice] } : m, m.doc),
    [m, overlayChoice],
  );
  useUrlSync(file, !!syncUrl);
  useEffect(() => onFileChange?.(file), [file, onFileChange]);
  const active = m.entries.find((e) => e.set.id === m.activeId) ?? m.entries[0];
  const onValid = useCallback(
    (set: Omit<ParameterSet, "id">) =>
      dispatch({ type: "sets", action: { type: "update", id: active.set.id, set } }),
    [active.set.id],
  );
  const totalIncrements = legs ? legs.reduce((s, l) => s + l.increments, 0) : 0;

  const copyLink = async () => {
    const url = `${location.origin}/sandbox#${URL_STATE_KEY}=${encodeState(file)}`;
    try {
      await navigator.clipboard.writeText(url);
      setLinkNote("Link copied: it carries the whole scenario.");
    } catch {
      setLinkNote("The browser refused the clipboard; copy the address bar instead.");
    }
  };

  return (
    <div
      className="mx-auto max-w-[1600px] space-y-4 px-4 py-4"
      data-testid="loading-desk"
      data-epoch={m.epoch}
    >
      {readOnly ? <ReadOnlyBanner teamName={teamName} /> : null}
      <div className="flex flex-wrap items-center gap-3">
        {readOnly ? (
          // Read-only: the values are text, not inputs that only refuse to change.
          <h2 className="min-w-0 flex-1 px-2 py-1 font-display text-xl font-semibold">{m.name}</h2>
        ) : (
          <>
            <label htmlFor="scenario-name" className="sr-only">
              Scenario name
            </label>
            <input
              id="scenario-name"
              value={m.name}
              onChange={(e) => dispatch({ type: "name", name: e.target.value })}
              className="min-w-0 flex-1 rounded-md border border-transparent bg-transparent px-2 py-1 font-display text-xl font-semibold hover:border-glaze-line focus:border-glaze-line"
            />
          </>
        )}
        <span role="status" className="text-xs text-verdigris-dark">
          {linkNote}
        </span>
        <button
          type="button"
          onClick={copyLink}
          className="rounded-md border border-glaze-line bg-white px-3 py-1.5 text-sm hover:bg-glaze-deep"
        >
          Copy link
        </button>
        {unsaved && !readOnly ? <UnsavedMark /> : null}
        {readOnly ? null : onSave ? (
          <button
            type="button"
            onClick={() => void onSave(file)}
            className="rounded-md bg-kiln px-3 py-1.5 text-sm text-white hover:bg-kiln-dark"
          >
            {saveLabel}
          </button>
        ) : (
          <Link
            href="/sign-in?next=/sandbox"
            onClick={() => onSignIn?.(file)}
            className="rounded-md bg-kiln px-3 py-1.5 text-sm text-white hover:bg-kiln-dark"
            title="Saving keeps scenarios in your team's store"
          >
            Sign in to save
          </Link>
        )}
      </div>
      <div className="grid grid-cols-1 gap-4 md:grid-cols-[minmax(270px,300px)_minmax(0,1fr)] xl:grid-cols-[minmax(320px,390px)_minmax(0,1fr)]">
        <div className="min-w-0 space-y-4">
          <Panel id="sets" title="Parameter sets">
            <SetListPanel
              entries={m.entries}
              activeId={active.set.id}
              readOnly={readOnly}
              store={store}
              onSelect={(id) => dispatch({ type: "select", id })}
              dispatch={(action) => dispatch({ type: "sets", action })}
              library={library}
            />
          </Panel>
          <Panel id="values" title={`Values of set ${active.set.id}`} aside={active.set.label}>
            <div className="space-y-3">
              <ParameterForm
                key={`${active.set.id}-${m.epoch}`}
                set={active.set}
                readOnly={readOnly}
                onValid={onValid}
              />
              <MeaningsPanel params={toMaterialParams(active.set)} />
            </div>
          </Panel>
          <Panel id="compare" title="Compare two sets">
            <SetDiffTable entries={m.entries} />
          </Panel>
          <AboutLaw />
        </div>
        <div className="min-w-0 space-y-4">
          <Panel id="path" title="Path" aside="load frame, (11, 22, 12), engineering shear strain">
            <PathEditor
              text={m.pathText}
              doc={m.doc}
              legs={legs ?? []}
              errors={m.pathErrors}
              readOnly={readOnly}
              onText={(text) => dispatch({ type: "pathText", text })}
              onDoc={(doc) => dispatch({ type: "pathDoc", doc })}
            />
          </Panel>
          <Panel id="charts" title="Charts">
            <RunErrors store={store} entries={m.entries} />
            <ChartGrid
              store={store}
              entries={m.entries}
              scenarioName={m.name}
              revision={revision}
              totalIncrements={totalIncrements}
              overlays={overlays}
              choices={m.charts}
              onChoices={(charts) => dispatch({ type: "charts", charts })}
            />
          </Panel>
          <Panel id="table" title="Results table">
            <ResultsTable store={store} entries={m.entries} />
          </Panel>
          <Panel id="export" title="Export and import">
            <ExportPanel
              name={m.name}
              entries={m.entries}
              store={store}
              file={file}
              revision={revision}
              readOnly={readOnly}
              onImport={(state) => dispatch({ type: "replace", state })}
            />
          </Panel>
        </div>
      </div>
    </div>
  );
}
