/**
 * identify(records, options): spec E end to end. Axis 1 (and 2) from cyclic tension, nu12 from a
 * transverse strain, b and k6 by one-dimensional searches, dcrit, the unilateral check and a
 * replay validation. Parameters no record informs keep their value in `options.base`; with no
 * tension-2 record an in-plane isotropic material (SMC) copies axis 1 to axis 2 (E.6: beta = alpha).
 */
import type { DamageLaw, MaterialParams } from "@/lib/mechanics/types";
import { cleanRecord } from "./clean";
import { couplingFromEquibiaxial, couplingFromOffAxis, couplingFromTransverse } from "./coupling";
import { failureDamage } from "./failure-damage";
import { identifyAxis, poissonFromRamp, type AxisIdentification } from "./identify-axis";
import { measureLoops } from "./loop-moduli";
import { boundWarning } from "./golden-section";
import { canReplay } from "./replay";
import { checkParams } from "@/lib/mechanics/validate";
import { shearWeightByReplay, shearWeightClosedForm } from "./shear-weight";
import { findTurningPoints } from "./turning-points";
import { recordName, type LoopRow, type TestRecordInput, type Warning } from "./types";
import { compressionModulus, validateByReplay, type ReplayValidation } from "./validation";
import { initialModulus } from "./initial-modulus";

export interface IdentifyOptions {
  base: MaterialParams; // values for what the records do not inform
  law?: DamageLaw;
  modulus?: "unloading" | "chord"; // per-loop modulus when loops show hysteresis (spec E.3)
  isotropic?: boolean; // default: true when no tension-2 record is given
}

export interface RecordReport {
  id: string;
  testType: TestRecordInput["testType"];
  loops: LoopRow[];
  E0: number | null;
  thresholdR2: number | null;
  freeIntercept: number | null; // E.6, mm/mm
  warnings: Warning[];
  validation: ReplayValidation | null;
}

export interface IdentifyResult {
  params: MaterialParams;
  identified: (keyof MaterialParams)[]; // which values came from the records
  records: RecordReport[];
  warnings: Warning[]; // union over records, each once
  notes: string[]; // decisions taken (source of E0, dcrit, b bounds, …)
}

export function identify(records: TestRecordInput[], options: IdentifyOptions): IdentifyResult {
  const law = options.law ?? "sqrtY";
  const p: MaterialParams = { ...options.base, law };
  const identified = new Set<keyof MaterialParams>();
  const notes: string[] = [];
  const set = (key: keyof MaterialParams, value: number | null | undefined) => {
    if (value === null || value === undefined || !Number.isFinite(value)) return;
    (p as unknown as Record<string, number>)[key] = value;
    identified.add(key);
  };
  const reports = new Map<string, { axis: AxisIdentification | null; extra: Warning[] }>();
  const byType = (t: TestRecordInput["testType"]) =>
    records.filter((r) => r.testType === t && !r.orientation);

  // Axis 1 and 2 (E.3–E.7), first record of each type that yields a threshold line.
  for (const [type, keys] of [
    ["tension-1", { E: "E1", a: "a1", Y0: "Y0_1", frozen: "alpha" }],
    ["tension-2", { E: "E2", a: "a2", Y0: "Y0_2", frozen: "beta" }],
  ] as const) {
    let done = false;
    for (const record of byType(type)) {
      const axis = identifyAxis(record, law, options.modulus);
      reports.set(record.id, { axis, extra: [] });
      if (done || !axis.E0 || !axis.threshold) continue;
      set(keys.E, axis.E0.E0);
      set(keys.a, axis.threshold.a);
      set(keys.Y0, axis.threshold.Y0);
      set(keys.frozen, axis.frozen?.alpha);
      notes.push(`${keys.E} from ${axis.E0.source} of record ${recordName(record)}`);
      if (type === "tension-1" && axis.loops.length > 0) {
        set("nu12", poissonFromRamp(axis.clean, axis.loops[0].peakIndex));
        const failure = failureDamage(
          axis.clean,
          axis.loops,
          axis.E0.E0,
          axis.threshold.a,
          axis.threshold.Y0,
        );
        if (failure && failure.dcrit < p.dmax) {
          set("dcrit", failure.dcrit);
          notes.push(
            `dcrit from the ${failure.source} of record ${recordName(record)}${failure.source === "last loop" ? " (a lower bound: no rupture recorded)" : ""}`,
          );
        }
      }
      done = true;
    }
  }
  // E.7: without a transverse strain in direction 1, nu21 from direction 2 (nu12 = nu21·E1/E2).
  const axis2 = byType("tension-2").map((r) => reports.get(r.id)?.axis)[0];
  if (!identified.has("nu12") && axis2?.loops.length) {
    const nu21 = poissonFromRamp(axis2.clean, axis2.loops[0].peakIndex);
    if (nu21 !== null) set("nu12", (nu21 * p.E1) / p.E2);
  }
  const isotropic = options.isotropic ?? byType("tension-2").length === 0;
  if (isotropic) {
    p.E2 = p.E1;
    p.Y0_2 = p.Y0_1;
    p.a2 = p.a1;
    p.beta = p.alpha;
    p.G12 = p.E1 / (2 * (1 + p.nu12));
    if (identified.has("E1"))
      ["E2", "Y0_2", "a2", "beta", "G12"].forEach((k) => identified.add(k as keyof MaterialParams));
    notes.push("in-plane isotropic: axis 2 copies axis 1, G12 = E1/(2(1 + nu12)), beta = alpha");
  }

  // Coupling b (E.8 a, b, c).
  const transverse = byType("transverse-after-damage-1").flatMap((record) => {
    reports.set(record.id, { axis: null, extra: [] });
    const clean = cleanRecord(record.points);
    const { loops } = measureLoops(
      clean.strain,
      clean.stress,
      findTurningPoints(clean.strain, clean.noiseStrain),
    );
    const E2dam = initialModulus(clean.strain, clean.stress, loops)?.E0;
    return E2dam && record.preDamageY1 ? [{ E2dam, Y1max: record.preDamageY1 }] : [];
  });
  const fromTransverse = couplingFromTransverse(transverse, p, 0.01);
  if (fromTransverse.b !== null) set("b", fromTransverse.b);
  else if (fromTransverse.upperBound !== null)
    notes.push(`b ≤ ${fromTransverse.upperBound.toPrecision(3)} (no measurable transverse damage)`);
  for (const record of byType("biaxial")) {
    reports.set(record.id, { axis: null, extra: [] });
    const clean = cleanRecord(record.points);
    const { loops } = measureLoops(
      clean.strain,
      clean.stress,
      findTurningPoints(clean.strain, clean.noiseStrain),
    );
    if (loops.length >= 2 && fromTransverse.b === null) set("b", couplingFromEquibiaxial(loops, p));
  }
  const offAxis = records.filter((r) => r.testType === "tension-1" && r.orientation);
  if (offAxis.length && !identified.has("b") && p.frame === "fixed" && !isotropic) {
    set("b", couplingFromOffAxis(cleanRecord(offAxis[0].points), offAxis[0].orientation ?? 0, p));
  }

  // In-plane shear (E.9) after b, which D.11 needs: G12 from the first ramp or sub-knee loops, then k6.
  for (const record of byType("shear-12")) {
    const clean = cleanRecord(record.points);
    const { loops } = measureLoops(
      clean.strain,
      clean.stress,
      findTurningPoints(clean.strain, clean.noiseStrain),
    );
    const G0 = initialModulus(clean.strain, clean.stress, loops);
    if (G0 && !isotropic) set("G12", G0.E0);
    const extra: Warning[] = [];
    if (loops.length >= 2 && p.frame === "fixed") {
      const k6 = isotropic ? shearWeightClosedForm(loops, p) : shearWeightByReplay(clean, p);
      set("k6", k6);
      const onBound = boundWarning("shear weight k6", k6, 0, 3);
      if (onBound) extra.push(onBound);
    }
    reports.set(record.id, { axis: null, extra });
    break;
  }

  // Unilateral check (E.11) on every record with tensile loops.
  for (const entry of reports.values()) {
    if (!entry.axis?.E0) continue;
    const Ecomp = compressionModulus(entry.axis.clean, entry.axis.loops);
    if (Ecomp !== null && Math.abs(Ecomp / entry.axis.E0.E0 - 1) > 0.05) {
      entry.extra.push("partial stiffness recovery — model assumes full");
    }
  }

  // Replay only an admissible set; otherwise say which values the law cannot take.
  const problems = checkParams(p);
  if (problems.length > 0) notes.push(`no replay validation: ${problems.join("; ")}`);
  const reportList: RecordReport[] = records.map((record) => {
    const entry = reports.get(record.id);
    const axis = entry?.axis ?? null;
    const clean = axis?.clean ?? cleanRecord(record.points);
    return {
      id: record.id,
      testType: record.testType,
      loops: axis?.loops ?? [],
      E0: axis?.E0?.E0 ?? null,
      thresholdR2: axis?.threshold?.r2 ?? null,
      freeIntercept: axis?.frozen?.freeIntercept ?? null,
      warnings: [...(axis?.warnings ?? []), ...(entry?.extra ?? [])],
      validation:
        problems.length === 0 && canReplay(record.testType) && clean.strain.length > 0
          ? validateByReplay(p, record.testType, clean)
          : null,
    };
  });
  const warnings = [...new Set(reportList.flatMap((r) => r.warnings))];
  return { params: p, identified: [...identified], records: reportList, warnings, notes };
}
