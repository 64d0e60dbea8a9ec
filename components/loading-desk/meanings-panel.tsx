import type { MaterialParams } from "@/lib/mechanics/types";
import { type AxisMeaning, deriveMeanings } from "@/lib/client/loading-desk/derived";

export interface MeaningsPanelProps {
  params: MaterialParams;
}

const g = (v: number, digits = 4) => v.toPrecision(digits);
const pct = (v: number) => `${(v * 100).toPrecision(3)} %`;

function rows(m: AxisMeaning) {
  return [
    ["threshold stress √(2·E·Y0)", `${g(m.thresholdStress)} MPa`, `at ${pct(m.thresholdStrain)}`],
    ["peak stress", `${g(m.peakStress)} MPa`, `at ${pct(m.peakStrain)}, d = ${g(m.peakDamage, 3)}`],
    ["unloading modulus at peak E·(1−d)", `${g(m.unloadingModulusAtPeak)} MPa`, ""],
    [
      "failure flag (d = dcrit)",
      `${g(m.failureStress)} MPa`,
      `at ${pct(m.failureStrain)}${m.failsBeforePeak ? ", before the peak" : ""}`,
    ],
  ];
}

/** What the values mean in uniaxial tension along each damage axis (closed forms, spec D.4). */
export function MeaningsPanel({ params }: MeaningsPanelProps) {
  const meanings = deriveMeanings(params);
  return (
    <section
      aria-labelledby="meanings-title"
      className="rounded-lg border border-glaze-line bg-glaze-deep/40 p-3"
    >
      <h3 id="meanings-title" className="font-display text-sm font-semibold">
        What these values mean
      </h3>
      <p className="text-xs text-ink-faint">
        Uniaxial tension along each damage axis, other stresses zero.
      </p>
      {meanings.map((m, i) => (
        <table key={i} className="mt-2 w-full text-xs" data-testid={`meaning-axis-${i + 1}`}>
          <caption className="text-left font-semibold text-ink-soft">Along axis {i + 1}</caption>
          <tbody>
            {m ? (
              rows(m).map(([what, value, note]) => (
                <tr key={what} className="border-t border-glaze-line/60">
                  <th scope="row" className="py-0.5 pr-2 text-left font-normal text-ink-soft">
                    {what}
                  </th>
                  <td className="whitespace-nowrap py-0.5 text-right font-mono">{value}</td>
                  <td className="py-0.5 pl-2 text-ink-faint">{note}</td>
                </tr>
              ))
            ) : (
              <tr>
                <td className="text-ink-faint">
                  No closed form for these values (check E, Y0 and a).
                </td>
              </tr>
            )}
          </tbody>
        </table>
      ))}
    </section>
  );
}
