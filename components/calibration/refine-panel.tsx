"use client";

import { useEffect, useRef, useState } from "react";

import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";
import { keptOnCancel, type RefineProgress, type RefineResult } from "@/lib/calibration/refine";
import { checkRefineBounds } from "@/lib/calibration/refine-bounds-check";
import { defaultBounds, FITTABLE, type FittableParam } from "@/lib/calibration/refine-params";
import type { MaterialParams } from "@/lib/mechanics/types";
import { FitCancelled, FitClient } from "@/workers/fit-client";

import { loadRecordInputs } from "./use-record-inputs";

/** Bounds shown with four significant digits; the user edits them as typed. */
const round4 = (v: number) => Number(v.toPrecision(4));

export interface RefinePanelProps {
  slug: string;
  recordIds: string[];
  names: Record<string, string>;
  start: MaterialParams;
  initiallyFree: FittableParam[];
  onResult: (
    result: RefineResult,
    free: FittableParam[],
    bounds: Record<string, [number, number]>,
  ) => void;
}

/** Levenberg–Marquardt over all chosen records in the fit worker, with progress and cancel. */
export function RefinePanel({
  slug,
  recordIds,
  names,
  start,
  initiallyFree,
  onResult,
}: RefinePanelProps) {
  const client = useRef<FitClient | null>(null);
  const [free, setFree] = useState<FittableParam[]>(initiallyFree);
  const [bounds, setBounds] = useState(
    () =>
      Object.fromEntries(
        FITTABLE.map((k) => [k, defaultBounds(k, start[k]).map(round4)]),
      ) as Record<FittableParam, [number, number]>,
  );
  const [progress, setProgress] = useState<RefineProgress | null>(null);
  const [running, setRunning] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [result, setResult] = useState<RefineResult | null>(null);

  useEffect(() => () => client.current?.dispose(), []);

  async function run() {
    // Bad boxes are said here, before any record loads or the worker starts.
    const problems = checkRefineBounds(start, free, bounds);
    if (problems.length > 0) {
      setError(problems.join(" "));
      return;
    }
    setError(null);
    setRunning(true);
    setProgress(null);
    let inputs: Awaited<ReturnType<typeof loadRecordInputs>> = [];
    try {
      inputs = await loadRecordInputs(slug, recordIds);
      client.current ??= new FitClient();
      const out = await client.current.refine(inputs, start, free, bounds, setProgress);
      setResult(out);
      onResult(out, free, bounds);
    } catch (e) {
      // A cancel keeps the best values of the last finished round, marked as such.
      const kept = e instanceof FitCancelled ? keptOnCancel(inputs, start, { free }, e.last) : null;
      if (kept) {
        setResult(kept);
        onResult(kept, free, bounds);
      }
      setError(
        e instanceof FitCancelled
          ? kept
            ? null
            : "Cancelled before the first round finished: nothing changed."
          : e instanceof Error
            ? e.message
            : "The refinement stopped.",
      );
    } finally {
      setRunning(false);
    }
  }

  const setBound = (k: FittableParam, i: 0 | 1, v: string) => {
    const next: [number, number] = [...bounds[k]];
    next[i] = Number(v);
    setBounds({ ...bounds, [k]: next });
  };

  return (
    <section aria-labelledby="refine-title" className="space-y-3">
      <h3 id="refine-title" className="font-medium">
        Refine by least squares
      </h3>
      <table className="text-sm">
        <thead className="text-ink-soft">
          <tr>
            <th className="pr-3 text-left font-medium">parameter</th>
            <th className="pr-3 font-medium">free</th>
            <th className="pr-3 font-medium">lower</th>
            <th className="font-medium">upper</th>
          </tr>
        </thead>
        <tbody>
          {FITTABLE.map((k) => (
            <tr key={k}>
              <td className="pr-3">{k}</td>
              <td className="pr-3 text-center">
                <input
                  type="checkbox"
                  aria-label={`${k} free`}
                  checked={free.includes(k)}
                  onChange={() =>
                    setFree(free.includes(k) ? free.filter((f) => f !== k) : [...free, k])
                  }
                />
              </td>
              {([0, 1] as const).map((i) => (
                <td key={i} className="pr-3">
                  <input
                    type="number"
                    step="any"
                    aria-label={`${k} ${i === 0 ? "lower" : "upper"} bound`}
                    className="w-24 rounded border border-glaze-line px-1 text-sm"
                    value={bounds[k][i]}
                    onChange={(e) => setBound(k, i, e.target.value)}
                  />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <div className="flex items-center gap-3">
        <Button type="button" onClick={run} pending={running} disabled={free.length === 0}>
          Refine
        </Button>
        {running ? (
          <Button type="button" variant="secondary" onClick={() => client.current?.cancel()}>
            Cancel
          </Button>
        ) : null}
        {progress ? (
          <span className="text-sm text-ink-soft" role="status">
            round {progress.round}, {progress.evaluations} replays, relative RMS{" "}
            {progress.rms.toExponential(2)}
          </span>
        ) : null}
      </div>
      <FieldError message={error ?? undefined} />
      {result ? (
        <div className="space-y-1 text-sm" data-testid="refine-result">
          {result.residuals.map((r) => (
            <p key={r.id}>
              {names[r.id] ?? r.id}: RMS {r.rms.toPrecision(3)} MPa over {r.points} points
            </p>
          ))}
          {/* records used and left out by name, the isotropy tie, the values kept */}
          {result.notes.map((note) => (
            <p key={note} className="text-ink-soft">
              {note}
            </p>
          ))}
          {result.inseparable.map((s) => (
            <p key={s.params.join()} className="text-amber-900">
              The data cannot separate {s.params.join(", ")}: {s.reason}
            </p>
          ))}
        </div>
      ) : null}
    </section>
  );
}
