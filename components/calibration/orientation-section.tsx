"use client";

import { useState } from "react";

import { Button } from "@/components/ui/button";
import { CLOSURES, CLOSURE_LABELS, type Closure } from "@/lib/calibration/micromechanics/closure";
import type { AlignedPly, Constituents } from "@/lib/calibration/micromechanics/halpin-tsai";
import {
  readLayers,
  SINGLE_LAYER,
  SKIN_CORE_SKIN,
  type LayerDraft,
} from "@/lib/calibration/micromechanics/orientation-presets";
import {
  orientationState,
  type OrientationResult,
} from "@/lib/calibration/micromechanics/orientation-state";
import { comparisonRoses, densityPicture } from "@/lib/calibration/micromechanics/roses";

import { PolarPicture } from "./polar-picture";
import { orientationSandboxLink } from "@/lib/client/sets/orientation-scenario";

/** What "Use as parameter set" hands on: the constants, the damage frame and where they came from. */
export interface OrientedEstimate {
  E1: number;
  E2: number;
  nu12: number;
  G12: number;
  thetaD: number;
  provenance: {
    kind: "orientation-state";
    closure: Closure;
    constituents: Constituents;
    layers: { fraction: number; a11: number; a12: number }[];
  };
}

const input = "block w-full rounded border border-glaze-line px-2 py-1 text-sm";

/**
 * Orientation state of a moulded part (spec A.5): layers through the thickness with their planar
 * orientation tensors, a closure, the fibre distribution of each layer and the stiffness rose of
 * the stack beside the aligned and planar-random ones.
 */
export function OrientationSection({
  ply,
  constituents,
  onUse,
}: {
  ply: AlignedPly | null;
  constituents: Constituents | null;
  onUse: (estimate: OrientedEstimate) => void;
}) {
  const [drafts, setDrafts] = useState<LayerDraft[]>(SKIN_CORE_SKIN);
  const [closure, setClosure] = useState<Closure>("exact");
  const read = readLayers(drafts);
  let result: OrientationResult | null = null;
  if (ply && read.ok) {
    result = orientationState({
      ply,
      closure,
      layers: read.layers.map((l) => ({
        fraction: l.fraction,
        tensor: { a11: l.a11, a12: l.a12 },
      })),
    });
  }
  const edit = (k: number, key: keyof LayerDraft, value: string) =>
    setDrafts(drafts.map((d, i) => (i === k ? { ...d, [key]: value } : d)));
  const roses = result && ply ? comparisonRoses(ply, result.stiffness) : null;

  return (
    <section
      className="mt-4 space-y-3 border-t border-glaze-line pt-4"
      aria-labelledby="orientation-heading"
    >
      <h3 id="orientation-heading" className="text-sm font-medium">
        Orientation state
      </h3>
      <p className="text-xs text-ink-soft">
        For a moulded part: the second-order orientation tensor of each layer through the thickness,
        from a mould-filling simulation or a micro-CT scan (a22 = 1 − a11; angles from the flow
        direction x). Starting values only, no design allowable.
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <Button type="button" variant="secondary" onClick={() => setDrafts(SKIN_CORE_SKIN)}>
          Skin / core / skin
        </Button>
        <Button type="button" variant="secondary" onClick={() => setDrafts(SINGLE_LAYER)}>
          One layer
        </Button>
        <Button
          type="button"
          variant="secondary"
          onClick={() =>
            setDrafts([
              ...drafts,
              { name: `Layer ${drafts.length + 1}`, fraction: "0", a11: "0.5", a12: "0" },
            ])
          }
        >
          Add layer
        </Button>
        <label className="text-xs" htmlFor="orientation-closure">
          Closure
          <select
            id="orientation-closure"
            className={input}
            value={closure}
            onChange={(e) => setClosure(e.target.value as Closure)}
          >
            {CLOSURES.map((c) => (
              <option key={c} value={c}>
                {CLOSURE_LABELS[c]}
              </option>
            ))}
          </select>
        </label>
      </div>
      <table className="w-full text-xs" data-testid="orientation-layers">
        <thead>
          <tr className="text-left text-ink-soft">
            <th className="py-1">Layer</th>
            <th>Thickness fraction</th>
            <th>a11</th>
            <th>a12</th>
            <th>Flow direction</th>
            <th>Order s</th>
            <th>E1 / E2 (MPa)</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {drafts.map((d, k) => {
            const layer = result?.layers[k];
            return (
              <tr key={k}>
                {(["name", "fraction", "a11", "a12"] as const).map((key) => (
                  <td key={key} className="pr-2">
                    <input
                      aria-label={`${key === "name" ? "Name" : key === "fraction" ? "Thickness fraction" : key} of row ${k + 1}`}
                      className={input}
                      type={key === "name" ? "text" : "number"}
                      step="any"
                      value={d[key]}
                      onChange={(e) => edit(k, key, e.target.value)}
                    />
                  </td>
                ))}
                <td>{layer ? `${layer.thetaA.toFixed(1)}°` : "–"}</td>
                <td>{layer ? layer.s.toFixed(3) : "–"}</td>
                <td>{layer ? `${layer.E1.toFixed(0)} / ${layer.E2.toFixed(0)}` : "–"}</td>
                <td>
                  <button
                    type="button"
                    className="text-kiln-dark underline disabled:opacity-40"
                    disabled={drafts.length === 1}
                    onClick={() => setDrafts(drafts.filter((_, i) => i !== k))}
                  >
                    Remove
                  </button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {!read.ok ? <p className="text-sm text-kiln-dark">{read.message}</p> : null}
      {!ply ? (
        <p className="text-sm text-kiln-dark">Complete the constituents above first.</p>
      ) : null}
      {result && roses && read.ok ? (
        <>
          <div className="flex flex-wrap gap-3" data-testid="orientation-pictures">
            {read.layers.map((l, k) => (
              <PolarPicture
                key={k}
                size={120}
                title={`Fibre directions, ${drafts[k].name || `layer ${k + 1}`}`}
                curves={[
                  {
                    label: "fibre density",
                    points: densityPicture({ a11: l.a11, a12: l.a12 }),
                    className: "stroke-verdigris",
                  },
                ]}
              />
            ))}
            <PolarPicture
              testId="stiffness-rose"
              title="Stiffness rose E(θ)"
              curves={[
                { label: "this state", points: roses.result, className: "stroke-kiln" },
                {
                  label: "aligned",
                  points: roses.aligned,
                  className: "stroke-ink-faint",
                  dashed: true,
                },
                { label: "planar random", points: roses.random, className: "stroke-verdigris" },
              ]}
            />
          </div>
          <p className="text-sm" data-testid="orientation-result">
            Stack: E1 = {result.stack.E1.toFixed(0)} MPa, E2 = {result.stack.E2.toFixed(0)} MPa,
            nu12 = {result.stack.nu12.toFixed(4)}, G12 = {result.stack.G12.toFixed(0)} MPa, damage
            frame thetaD = {result.stack.thetaD.toFixed(1)}°. Tsai–Pagano invariants averaged with
            the {CLOSURE_LABELS[closure].toLowerCase()} closure (Advani &amp; Tucker 1987).
          </p>
          <Button
            type="button"
            variant="secondary"
            disabled={!constituents}
            onClick={() =>
              constituents &&
              onUse({
                E1: result.stack.E1,
                E2: result.stack.E2,
                nu12: result.stack.nu12,
                G12: result.stack.G12,
                thetaD: result.stack.thetaD,
                provenance: {
                  kind: "orientation-state",
                  closure,
                  constituents,
                  layers: read.layers,
                },
              })
            }
          >
            Use as parameter set
          </Button>
          <a
            className="ml-3 text-sm text-verdigris-dark hover:underline"
            href={orientationSandboxLink(result.stack)}
            target="_blank"
            rel="noopener"
          >
            Open in the sandbox
          </a>
          <p className="text-xs text-ink-soft">
            The sandbox opens this state&apos;s E1, E2, nu12, G12 and thetaD over the invented demo
            set&apos;s damage values, beside the demo set, on tension → unload → compression and
            growing cycles; signed in, &ldquo;Save to team…&rdquo; keeps it as a scenario.
          </p>
        </>
      ) : null}
    </section>
  );
}
