"use client";

import { useState } from "react";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { allSetsCsv, setCsv } from "@/lib/client/loading-desk/csv-export";
import {
  provenanceName,
  resultsCsvName,
  scenarioFileName,
} from "@/lib/client/loading-desk/file-names";
import { EXPORT_SIGNIFICANT_DIGITS } from "@/lib/client/loading-desk/export-columns";
import { provenanceText } from "@/lib/client/loading-desk/provenance";
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
  /** "revision 4" on a saved revision, null on scratch data; written into the provenance file. */
  revision?: string | null;
  readOnly?: boolean;
  onImport: (state: LoadingDeskState) => void;
}

const btn =
  "rounded-md border border-glaze-line bg-white px-3 py-1.5 text-sm hover:bg-glaze-deep disabled:opacity-40";

export function ExportPanel({
  name,
  entries,
  store,
  file,
  revision = null,
  readOnly,
  onImport,
}: ExportPanelProps) {
  const [which, setWhich] = useState("all");
  const [importErrors, setImportErrors] = useState<string[]>([]);
  const [notice, setNotice] = useState("");

  const finished = () =>
    entries.flatMap((e) => {
      const buffer = store.get(e.set.id)?.buffer;
      return buffer ? [{ set: e.set, buffer }] : [];
    });
  const chosen = () => {
    const done = finished();
    if (which === "all") return { label: null, done };
    const one = done.filter((d) => d.set.id === which);
    return { label: one.length ? `${one[0].set.id} ${one[0].set.label}` : null, done: one };
  };

  // The byte-order mark makes spreadsheets open the file as UTF-8 (σ, ε in the header); pandas
  // and lib/csv skip it.
  const BOM = "\uFEFF";
  const exportCsv = () => {
    const { label, done } = chosen();
    if (which === "all") {
      const rows = done.map((d) => ({ id: d.set.id, buffer: d.buffer }));
      downloadText(resultsCsvName(name, null), BOM + allSetsCsv(rows), "text/csv;charset=utf-8");
    } else if (done.length) {
      downloadText(
        resultsCsvName(name, label),
        BOM + setCsv(done[0].buffer),
        "text/csv;charset=utf-8",
      );
    }
  };

  const exportProvenance = () => {
    const { label, done } = chosen();
    if (which !== "all" && !done.length) return;
    const text = provenanceText({
      scenario: name,
      revision,
      sets: done.map((d) => d.set),
      path: file.path,
      csvFile: resultsCsvName(name, label),
    });
    downloadText(provenanceName(name, label), text, "application/json");
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
        <button type="button" className={btn} onClick={exportProvenance}>
          Download provenance
        </button>
      </div>
      <p className="text-xs text-ink-faint">
        One header line with units (σ11 [MPa], ε11 [-]); numbers to {EXPORT_SIGNIFICANT_DIGITS}{" "}
        significant digits. The provenance file (same name, .provenance.json) says which scenario,
        revision and values made it, when, and carries the caution.
      </p>
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
