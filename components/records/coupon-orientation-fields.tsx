"use client";

import type { CouponOrientationDraft } from "@/lib/calibration/micromechanics/coupon-orientation";

import { FieldError } from "@/components/ui/field";

export const NEW_COUPON_ORIENTATION: CouponOrientationDraft = {
  cutAngle: "0",
  layers: [{ fraction: "1", a11: "0.8", a12: "0" }],
};

const SKIN_CORE_SKIN: CouponOrientationDraft["layers"] = [
  { fraction: "0.25", a11: "0.8", a12: "0" },
  { fraction: "0.5", a11: "0.2", a12: "0" },
  { fraction: "0.25", a11: "0.8", a12: "0" },
];

type Layer = CouponOrientationDraft["layers"][number];

/**
 * The optional "Coupon orientation" of an upload (spec A.5): the cut angle φ from the flow
 * direction and each layer's thickness fraction and planar tensor, as a mould-filling simulation
 * or a micro-CT scan gives them. With it, identification takes thetaD = thetaA − φ.
 */
export function CouponOrientationFields({
  idPrefix,
  value,
  onChange,
  error,
}: {
  idPrefix: string;
  value: CouponOrientationDraft | null;
  onChange: (next: CouponOrientationDraft | null) => void;
  error?: string;
}) {
  const input = "block w-full rounded-md border border-glaze-line bg-white px-2 py-1 text-sm";
  const editLayer = (k: number, key: keyof Layer, v: string) =>
    value &&
    onChange({
      ...value,
      layers: value.layers.map((l, i) => (i === k ? { ...l, [key]: v } : l)),
    });
  return (
    <fieldset className="space-y-3" data-testid="coupon-orientation">
      <legend className="mb-2 text-sm font-medium">Coupon orientation</legend>
      <label className="flex items-center gap-2 text-sm">
        <input
          type="checkbox"
          checked={value !== null}
          onChange={(e) => onChange(e.target.checked ? NEW_COUPON_ORIENTATION : null)}
        />
        The coupon&apos;s orientation state is known (mould-filling simulation or micro-CT scan)
      </label>
      {value ? (
        <>
          <label className="block text-sm sm:w-1/3" htmlFor={`${idPrefix}-cut`}>
            Cut angle φ (° from the flow direction)
            <input
              id={`${idPrefix}-cut`}
              className={`mt-1 ${input}`}
              type="number"
              step="any"
              value={value.cutAngle}
              onChange={(e) => onChange({ ...value, cutAngle: e.target.value })}
            />
          </label>
          <table className="w-full text-sm">
            <thead>
              <tr className="text-left text-ink-soft">
                <th className="py-1">Layer</th>
                <th>Thickness fraction</th>
                <th>a11</th>
                <th>a12</th>
                <th />
              </tr>
            </thead>
            <tbody>
              {value.layers.map((l, k) => (
                <tr key={k}>
                  <td className="pr-2">{k + 1}</td>
                  {(["fraction", "a11", "a12"] as const).map((key) => (
                    <td key={key} className="pr-2">
                      <input
                        aria-label={`${key === "fraction" ? "Thickness fraction" : key} of layer ${k + 1}`}
                        className={input}
                        type="number"
                        step="any"
                        value={l[key]}
                        onChange={(e) => editLayer(k, key, e.target.value)}
                      />
                    </td>
                  ))}
                  <td>
                    <button
                      type="button"
                      className="text-kiln-dark underline disabled:opacity-40"
                      disabled={value.layers.length === 1}
                      onClick={() =>
                        onChange({ ...value, layers: value.layers.filter((_, i) => i !== k) })
                      }
                    >
                      Remove
                    </button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <div className="flex gap-4 text-sm">
            <button
              type="button"
              className="text-verdigris-dark underline"
              onClick={() =>
                onChange({
                  ...value,
                  layers: [...value.layers, { fraction: "0", a11: "0.5", a12: "0" }],
                })
              }
            >
              Add a layer
            </button>
            <button
              type="button"
              className="text-verdigris-dark underline"
              onClick={() => onChange({ ...value, layers: SKIN_CORE_SKIN })}
            >
              Skin/core/skin
            </button>
          </div>
          <p className="text-xs text-ink-faint">
            a22 = 1 − a11; the fractions add up to 1. Identification then takes the damage frame
            thetaD = thetaA − φ, with thetaA the flow direction of the thickness-averaged tensor.
          </p>
        </>
      ) : null}
      <FieldError message={error} />
    </fieldset>
  );
}
