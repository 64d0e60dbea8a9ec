import { createHash } from "node:crypto";

import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";

import { testRecords } from "@/db/schema/test-records";
import { MAX_FILE_BYTES } from "@/lib/csv/limits";
import { getTestRecord } from "@/lib/server/records/records";
import { uploadTestRecord } from "@/lib/server/records/upload";

import { openTestDb } from "../support/db";
import { makeTeamWithAllRoles, type TeamFixture } from "../support/team";
import { DEMO_CSV, recordCount, uploadBody } from "./support";

const db = openTestDb();
let t: TeamFixture;

beforeAll(async () => {
  t = await makeTeamWithAllRoles(db);
});

describe("upload of a test record", () => {
  it("stores the original file, its hash and the parsed points", async () => {
    const out = await uploadTestRecord(db, t.members.editor, t.slug, uploadBody(DEMO_CSV));
    expect(out.name).toBe("demo-cyclic-tension");
    expect(out.pointCount).toBe(DEMO_CSV.trim().split("\n").length - 1);
    const [row] = await db
      .select()
      .from(testRecords)
      .where(and(eq(testRecords.teamId, t.teamId), eq(testRecords.id, out.id)));
    expect(row.fileText).toBe(DEMO_CSV);
    expect(row.fileSha256).toBe(createHash("sha256").update(DEMO_CSV).digest("hex"));
    expect(row.fileSize).toBe(Buffer.byteLength(DEMO_CSV));
    expect(row.points.strain).toHaveLength(out.pointCount);
    expect(row.points.transverseStrain).toHaveLength(out.pointCount);
    const second = DEMO_CSV.split("\n")[2].split(",").map(Number);
    expect(row.points.strain[1]).toBeCloseTo(second[0], 12);
    expect(row.points.stress[1]).toBeCloseTo(second[1], 9);
    expect(row.mapping).toMatchObject({ strain: 0, stress: 1, strainUnit: "mm/mm" });
    const view = await getTestRecord(db, t.members.viewer, t.slug, out.id);
    expect(view.specimenId).toBe("DEMO-01");
    expect(view.createdBy?.name).toBe("editor");
  });

  it("reads semicolons, decimal commas and percent strain into mm/mm and MPa", async () => {
    const text = "strain [%];stress [GPa]\n0,0;0,0\n0,1;0,011\n0,2;0,022\n";
    const out = await uploadTestRecord(db, t.members.owner, t.slug, {
      ...uploadBody(text),
      mapping: { strain: 0, stress: 1 },
      name: "semicolon file",
    });
    const view = await getTestRecord(db, t.members.owner, t.slug, out.id);
    expect(view.points.strain[2]).toBeCloseTo(0.002, 12);
    expect(view.points.stress[2]).toBeCloseTo(22, 9);
  });
});

const header = "strain [mm/mm],stress [MPa]\n";
const MALFORMED: [string, string, RegExp][] = [
  ["empty", "", /file is empty/],
  [
    "text in a number",
    `${header}0.001,10\n0.002,abc\n`,
    /line 3, column "stress \[MPa\]": "abc" is not a number/,
  ],
  [
    "ragged rows",
    `${header}0.001,10\n0.002,20,5\n0.003,30\n`,
    /line 3: 3 cells where line 1 has 2/,
  ],
  ["wrong delimiter", "strain|stress\n0.001|10\n0.002|20\n", /line 1: only one column found/],
  [
    "too large",
    `${header}${"0.001,10\n".repeat(Math.ceil(MAX_FILE_BYTES / 9) + 10)}`,
    /larger than 10 MB/,
  ],
];

describe("malformed files save nothing", () => {
  for (const [label, text, message] of MALFORMED) {
    it(label, async () => {
      const before = await recordCount(db, t.teamId);
      const failure = await uploadTestRecord(db, t.members.editor, t.slug, uploadBody(text)).catch(
        (e: unknown) => e as { code: string; message: string },
      );
      expect(failure).toMatchObject({ code: expect.stringMatching(/^invalid:/) });
      expect((failure as { message: string }).message).toMatch(message);
      expect(await recordCount(db, t.teamId)).toBe(before);
    });
  }
});
