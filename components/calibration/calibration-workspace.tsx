"use client";

import { useState } from "react";

import { postJson } from "@/components/records/post-json";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";
import type { TestRecordSummary } from "@/db/queries/test-records";
import { DEMO_PARAMS } from "@/lib/calibration/demo-curves";
import type { RefineResult } from "@/lib/calibration/refine";
import { REFINED, refinedValueMarks } from "@/lib/calibration/refined-value-marks";
import { FITTABLE, type FittableParam } from "@/lib/calibration/refine-params";
import type { IdentifyResponse } from "@/lib/server/records/identify-records";

import { ConstituentsForm, type ElasticEstimate } from "./constituents-form";
import { DesignCaution } from "./design-caution";
import { IdentifyReport } from "./identify-report";
import type { OrientedEstimate } from "./orientation-section";
import { ParamsTable } from "./params-table";
import { RecordPicker } from "./record-picker";
import { RefinePanel } from "./refine-panel";
import { UncertaintyTable } from "./uncertainty-table";
import { SaveFitForm } from "./save-fit-form";

/** Pick records → identify (server, spec E) → optionally refine (worker) → save as a set. */
export function CalibrationWorkspace({
  slug,
  records,
}: {
  slug: string;
  records: TestRecordSummary[];
}) {
  const [selected, setSelected] = useState<string[]>([]);
  const [law, setLaw] = useState<"sqrtY" | "linY">("sqrtY");
  const [estimate, setEstimate] = useState<ElasticEstimate | null>(null);
  // The orientation state behind the estimate, if it came from one: saved with the set.
  const [estimateState, setEstimateState] = useState<OrientedEstimate["provenance"] | null>(null);
  const [identified, setIdentified] = useState<IdentifyResponse | null>(null);
  const [refined, setRefined] = useState<{
    result: RefineResult;
    free: FittableParam[];
    bounds: object;
  } | null>(null);
  const [error, setError] = useState<string>();
  const [pending, setPending] = useState(false);

  async function runIdentify() {
    setPending(true);
    setError(undefined);
    setRefined(null);
    const base = estimate ? { ...DEMO_PARAMS, ...estimate, label: "" } : undefined;
    const res = await postJson<IdentifyResponse>(`/api/v1/teams/${slug}/fits/identify`, {
      recordIds: selected,
      law,
      base,
    });
    setPending(false);
    if (res.ok) setIdentified(res.data);
    else setError(res.message);
  }

  const common = { recordIds: selected };
  const saveBody = refined
    ? {
        ...common,
        method: "refine",
        params: { ...refined.result.params, label: "" },
        free: refined.free,
        bounds: refined.bounds,
      }
    : {
        ...common,
        method: "identify",
        law,
        base: estimate ? { ...DEMO_PARAMS, ...estimate, label: "" } : undefined,
        baseOrientation:
          estimate && estimateState
            ? {
                closure: estimateState.closure,
                layers: estimateState.layers,
                constituents: estimateState.constituents,
              }
            : undefined,
      };

  return (
    <div className="space-y-8">
      <DesignCaution />
      <RecordPicker records={records} selected={selected} onChange={setSelected} />
      <ConstituentsForm
        onUse={(values, state) => {
          setEstimate(values);
          setEstimateState(state ?? null);
        }}
      />
      {estimate ? (
        <p className="text-sm text-ink-soft">
          Starting values: E1 {estimate.E1.toFixed(0)} MPa, E2 {estimate.E2.toFixed(0)} MPa
          {estimate.thetaD !== undefined
            ? `, damage frame ${estimate.thetaD.toFixed(1)}°`
            : ""}{" "}
          (estimates from constituents).
        </p>
      ) : null}
      <div className="flex items-end gap-3">
        <label className="text-sm" htmlFor="fit-law">
          Damage law
          <select
            id="fit-law"
            className="mt-1 block rounded border border-glaze-line px-2 py-2"
            value={law}
            onChange={(e) => setLaw(e.target.value as "sqrtY" | "linY")}
          >
            <option value="sqrtY">d grows with √Y</option>
            <option value="linY">d grows with Y</option>
          </select>
        </label>
        <Button
          type="button"
          onClick={runIdentify}
          pending={pending}
          disabled={selected.length === 0}
        >
          Identify
        </Button>
      </div>
      <FieldError message={error} />
      {identified ? (
        <>
          <IdentifyReport result={identified} />
          <RefinePanel
            key={JSON.stringify(identified.params)}
            slug={slug}
            recordIds={selected}
            names={identified.recordNames}
            start={identified.params}
            initiallyFree={FITTABLE.filter((k) => identified.identified.includes(k))}
            onResult={(result, free, bounds) => setRefined({ result, free, bounds })}
          />
          {refined ? (
            <div className="space-y-2">
              <h3 className="font-medium">Refined values</h3>
              <ParamsTable
                params={refined.result.params}
                identified={refined.result.free}
                sourceWord={REFINED}
                marks={refinedValueMarks(refined.result, identified.identified)}
              />
              {refined.result.uncertainty ? (
                <UncertaintyTable
                  uncertainty={refined.result.uncertainty}
                  law={refined.result.params.law}
                />
              ) : null}
            </div>
          ) : null}
          <SaveFitForm slug={slug} body={saveBody} />
        </>
      ) : null}
    </div>
  );
}
