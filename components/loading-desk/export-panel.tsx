"use client";

import { useState } from "react";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { allSetsCsv, setCsv } from "@/lib/client/loading-desk/csv-export";
import { resultsCsvName, scenarioFileName } from "@/lib/client/loading-desk/file-names";
import type { ResultsStore } from "@/lib/client/loading-desk/results-store";
import {
  fromScenario,
  type ScenarioFileJson,
  type LoadingDeskState,
} from "@/lib/client/loading-desk/scenario-state";
import type { SetEntry } from "@/lib/client/loading-desk/set-list";
import { Cautions } from "./cautions";
import { downloadText } from "./download";

export interface ExportPanelProps {
  name: string;
  entries: SetEntry[];
  store: ResultsStore;
  file: ScenarioFileJson;
  readOnly?: boolean;
  onImport: (state: LoadingDeskState) => void;
}

const btn =
  "rounded-md border border-glaze-line bg-white px-3 py-1.5 text-sm hover:bg-glaze-deep disabled:opacity-40";

export function ExportPanel({ name, entries, store, file, readOnly, onImport }: ExportPanelProps) {
  const [which, setWhich] = useState("all");
  const [importErrors, setImportErrors] = useState<string[]>([]);
  const [notice, setNotice] = useState("");

  const exportCsv = () => {
    const done = entries.flatMap((e) => {
      const buffer = store.get(e.set.id)?.buffer;
      return buffer ? [{ id: e.set.id, label: e.set.label, buffer }] : [];
    });
    if (which === "all") {
      downloadText(resultsCsvName(name, null), allSetsCsv(done), "text/csv");
      return;
    }
    const one = done.find((d) => d.id === which);
    if (one)
      downloadText(resultsCsvName(name, `${one.id} ${one.label}`), setCsv(one.buffer), "text/csv");
  };

  const importFile = async (f: File | undefined) => {
    setImportErrors([]);
    setNotice("");
    if (!f) return;
    let json: unknown;
    try {
      json = JSON.parse(await f.text());
    } catch (err) {
      setImportErrors([`${f.name} is not JSON: ${(err as Error).message}`]);
      return;
    }
    const parsed = parseScenarioFile(json);
    if (!parsed.ok) {
      setImportErrors(parsed.errors);
      return;
    }
    onImport(fromScenario(parsed.scenario, json));
    setNotice(`Opened ${f.name}.`);
  };

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-2">
        <button
          type="button"
          className={btn}
          onClick={() =>
            downloadText(scenarioFileName(name), JSON.stringify(file, null, 2), "application/json")
          }
        >
          Download scenario file
        </button>
        {!readOnly && (
          <label
            className={`${btn} cursor-pointer focus-within:outline-2 focus-within:outline-verdigris`}
          >
            Open scenario file…
            <input
              type="file"
              accept=".json,application/json"
              className="sr-only"
              data-testid="import-file"
              onChange={(e) => {
                void importFile(e.target.files?.[0]);
                e.target.value = "";
              }}
            />
          </label>
        )}
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <label htmlFor="csv-which" className="text-sm text-ink-soft">
          Results CSV of
        </label>
        <select
          id="csv-which"
          value={which}
          onChange={(e) => setWhich(e.target.value)}
          className="rounded border border-glaze-line bg-white px-2 py-1 text-sm"
        >
          <option value="all">all sets (first column: set)</option>
          {entries.map((e) => (
            <option key={e.set.id} value={e.set.id}>
              set {e.set.id}: {e.set.label}
            </option>
          ))}
        </select>
        <button type="button" className={btn} onClick={exportCsv}>
          Download CSV
        </button>
      </div>
      <p className="text-xs text-ink-faint">Chart images: the PNG and SVG buttons on each chart.</p>
      <div role={importErrors.length ? "alert" : "status"} aria-live="polite">
        {notice && <p className="text-sm text-verdigris-dark">{notice}</p>}
        {importErrors.length > 0 && (
          <div
            className="rounded-md border border-kiln/40 bg-kiln-light px-3 py-2 text-sm text-kiln-dark"
            data-testid="import-errors"
          >
            <p className="font-medium">This file cannot be opened:</p>
            <ul className="mt-1 list-disc pl-5 font-mono text-xs">
              {importErrors.slice(0, 12).map((e) => (
                <li key={e}>{e}</li>
              ))}
            </ul>
          </div>
        )}
      </div>
      <Cautions compact />
    </div>
  );
}
