import { beforeAll, describe, expect, it } from "vitest";

import { findParameterSetView } from "@/db/queries/parameter-sets";
import { DEMO_PARAMS, demoCyclicTension } from "@/lib/calibration/demo-curves";
import { getFit } from "@/lib/server/records/fits";
import { identifyRecords } from "@/lib/server/records/identify-records";
import { saveFit } from "@/lib/server/records/save-fit";
import { uploadTestRecord } from "@/lib/server/records/upload";

import { openTestDb, unique } from "../support/db";
import { makeTeamWithAllRoles, type TeamFixture } from "../support/team";
import { uploadBody } from "./support";

const db = openTestDb();
let t: TeamFixture;
let recordId: string;

/** 7 cycles × 2 legs × 143 increments + 1 ≈ 2,000 points, invented, with light noise. */
function csv2000(): string {
  const p = demoCyclicTension(DEMO_PARAMS, { increments: 143, noiseStress: 0.05, seed: 7 });
  const rows = ["strain,stress [MPa]"];
  for (let i = 0; i < p.strain.length; i++) rows.push(`${p.strain[i]},${p.stress[i]}`);
  return rows.join("\n");
}

beforeAll(async () => {
  t = await makeTeamWithAllRoles(db);
  const text = csv2000();
  const up = await uploadTestRecord(db, t.members.editor, t.slug, {
    ...uploadBody(text),
    mapping: { strain: 0, stress: 1 },
  });
  expect(up.pointCount).toBeGreaterThanOrEqual(2000);
  recordId = up.id;
});

describe("identification on a 2,000-point record through the service", () => {
  it("finds the loops and the generating values", async () => {
    const result = await identifyRecords(db, t.members.editor, t.slug, { recordIds: [recordId] });
    const report = result.records[0];
    expect(report.loops.length).toBeGreaterThanOrEqual(6);
    expect(result.params.E1).toBeGreaterThan(DEMO_PARAMS.E1 * 0.97);
    expect(result.params.E1).toBeLessThan(DEMO_PARAMS.E1 * 1.03);
    expect(Math.abs(result.params.a1 / DEMO_PARAMS.a1 - 1)).toBeLessThan(0.1);
    expect(Math.abs(result.params.alpha / DEMO_PARAMS.alpha - 1)).toBeLessThan(0.1);
    expect(result.identified).toEqual(expect.arrayContaining(["E1", "Y0_1", "a1", "alpha"]));
    expect(result.recordNames[recordId]).toBe("demo-cyclic-tension");
  });

  it("saves a fit and a parameter set whose provenance names record, method and residual", async () => {
    const name = unique("Fitted set");
    const saved = await saveFit(db, t.members.editor, t.slug, {
      method: "identify",
      recordIds: [recordId],
      name,
    });
    const set = await findParameterSetView(db, t.teamId, saved.parameterSetId);
    expect(set?.name).toBe(name);
    expect(set?.provenance.kind).toBe("fitted");
    expect(set?.provenance.records?.[0]).toContain(recordId);
    expect(set?.provenance.method).toMatch(/identification from the loading loops/);
    const rms = Object.values(set?.provenance.residuals ?? {})[0];
    // The residual is the library's own replay validation of the identified set (spec E.11).
    const identified = await identifyRecords(db, t.members.editor, t.slug, {
      recordIds: [recordId],
    });
    expect(rms).toBeCloseTo(identified.records[0].validation!.rms, 9);
    const { fit, overlay } = await getFit(db, t.members.viewer, t.slug, saved.id);
    expect(fit.parameterSetName).toBe(name);
    expect(fit.uncertainty).toBeNull(); // identification gives no intervals
    expect(overlay[0].computed?.y.length).toBe(overlay[0].measured.y.length);
  });

  it("a refined set is replayed on the server for its residuals; a duplicate name saves nothing", async () => {
    const name = unique("Refined");
    const params = { ...DEMO_PARAMS, E1: 11100, label: "x" };
    const first = await saveFit(db, t.members.owner, t.slug, {
      method: "refine",
      recordIds: [recordId],
      name,
      params,
      free: ["E1"],
    });
    expect(first.residuals[0].rms).toBeGreaterThan(0);
    // Issue 14: the plan is made again on the server from the stored 0° tension record.
    const { fit } = await getFit(db, t.members.viewer, t.slug, first.id);
    expect(fit.warnings).toEqual([]); // E1 ≠ E2: no tie; E1 is informed
    // Issue 14 item 4: the uncertainty of the free value, worked out on the stored record
    expect(fit.uncertainty?.params.map((p) => p.name)).toEqual(["E1"]);
    const e1 = fit.uncertainty!.params[0];
    expect(e1.value).toBe(11100);
    expect(e1.se).toBeGreaterThan(0);
    expect(e1.low!).toBeLessThan(11100);
    expect(e1.high!).toBeGreaterThan(11100);
    const kept = await saveFit(db, t.members.owner, t.slug, {
      method: "refine",
      recordIds: [recordId],
      name: unique("Refined k6"),
      params: { ...DEMO_PARAMS, label: "x" }, // in-plane isotropic (spec A.3)
      free: ["E1", "E2", "k6"],
    });
    const keptFit = (await getFit(db, t.members.viewer, t.slug, kept.id)).fit;
    expect(keptFit.warnings).toContainEqual(expect.stringContaining("in-plane isotropic"));
    expect(keptFit.warnings).toContainEqual(
      expect.stringMatching(/^not informed by these records, kept at the start value: k6/),
    );
    const again = await saveFit(db, t.members.owner, t.slug, {
      method: "refine",
      recordIds: [recordId],
      name,
      params,
    }).catch((e: { code: string }) => e);
    expect(again).toMatchObject({ code: "conflict:name" });
  });
});
