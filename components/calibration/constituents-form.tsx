"use client";

import { useState } from "react";

import { Button } from "@/components/ui/button";
import { alignedPly, type Constituents } from "@/lib/calibration/micromechanics/halpin-tsai";
import { elasticStart, type Layout } from "@/lib/calibration/micromechanics/starting-values";
import { volumeFraction } from "@/lib/calibration/micromechanics/volume-fraction";

import { OrientationSection, type OrientedEstimate } from "./orientation-section";

/** Elastic starting values; an orientation state also gives the damage frame thetaD. */
export type ElasticEstimate = ReturnType<typeof elasticStart> & { thetaD?: number };

const FIELDS = [
  ["Ef", "Fibre modulus Ef (MPa)", "72000"],
  ["nuf", "Fibre Poisson ratio", "0.22"],
  ["Em", "Matrix modulus Em (MPa)", "3000"],
  ["num", "Matrix Poisson ratio", "0.35"],
  ["wf", "Fibre weight fraction (0–1)", "0.3"],
  ["rhoF", "Fibre density (g/cm³)", "2.54"],
  ["rhoM", "Matrix density (g/cm³)", "1.2"],
  ["aspect", "Fibre length over diameter l/d", "500"],
] as const;

/** Halpin–Tsai ply, planar-random average or aligned: elastic starting values, not results. */
export function ConstituentsForm({
  onUse,
}: {
  onUse: (e: ElasticEstimate, provenance?: OrientedEstimate["provenance"]) => void;
}) {
  const [values, setValues] = useState<Record<string, string>>(
    Object.fromEntries(FIELDS.map(([k, , d]) => [k, d])),
  );
  const [layout, setLayout] = useState<Layout>("planar-random");
  const n = (k: string) => Number(values[k]);
  const Vf = volumeFraction(n("wf"), n("rhoF"), n("rhoM"));
  const valid = FIELDS.every(([k]) => Number.isFinite(n(k)) && n(k) > 0) && Vf > 0 && Vf < 1;
  const constituents: Constituents | null = valid
    ? { Ef: n("Ef"), nuf: n("nuf"), Em: n("Em"), num: n("num"), Vf, aspect: n("aspect") }
    : null;
  const estimate = constituents ? elasticStart(constituents, layout) : null;
  return (
    <details className="rounded-lg border border-glaze-line bg-white/70 p-4">
      <summary className="cursor-pointer text-sm font-medium">
        Starting values from constituents (estimates)
      </summary>
      <div className="mt-3 grid gap-3 sm:grid-cols-4">
        {FIELDS.map(([k, label]) => (
          <label key={k} className="text-xs" htmlFor={`mm-${k}`}>
            {label}
            <input
              id={`mm-${k}`}
              type="number"
              step="any"
              className="mt-1 block w-full rounded border border-glaze-line px-2 py-1 text-sm"
              value={values[k]}
              onChange={(e) => setValues({ ...values, [k]: e.target.value })}
            />
          </label>
        ))}
        <label className="text-xs" htmlFor="mm-layout">
          Fibre layout
          <select
            id="mm-layout"
            className="mt-1 block w-full rounded border border-glaze-line px-2 py-1 text-sm"
            value={layout}
            onChange={(e) => setLayout(e.target.value as Layout)}
          >
            <option value="planar-random">Planar random (SMC, mat)</option>
            <option value="aligned">Aligned</option>
          </select>
        </label>
      </div>
      {estimate ? (
        <p className="mt-3 text-sm" data-testid="constituents-estimate">
          Estimate (Vf = {Vf.toFixed(3)}): E1 = {estimate.E1.toFixed(0)} MPa, E2 ={" "}
          {estimate.E2.toFixed(0)} MPa, nu12 = {estimate.nu12.toFixed(3)}, G12 ={" "}
          {estimate.G12.toFixed(0)} MPa. Halpin–Tsai ply (Halpin &amp; Kardos 1976), planar-random
          average of invariants (Tsai &amp; Pagano 1968). Estimates only: the records decide.
        </p>
      ) : (
        <p className="mt-3 text-sm text-kiln-dark">Give positive numbers; Vf must lie in (0, 1).</p>
      )}
      <Button
        type="button"
        variant="secondary"
        className="mt-3"
        disabled={!estimate}
        onClick={() => estimate && onUse(estimate)}
      >
        Use as starting values
      </Button>
      <OrientationSection
        ply={constituents ? alignedPly(constituents) : null}
        constituents={constituents}
        onUse={({ provenance, ...values }) => onUse(values, provenance)}
      />
    </details>
  );
}
