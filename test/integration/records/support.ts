import { readFileSync } from "node:fs";
import path from "node:path";

import { eq } from "drizzle-orm";

import type { Db } from "@/db/client";
import { testRecords } from "@/db/schema/test-records";

export const DEMO_CSV = readFileSync(
  path.join(process.cwd(), "test/fixtures/calibration/demo-cyclic-tension.csv"),
  "utf8",
);

export const META = {
  testType: "tension-1",
  loading: "cyclic",
  specimenId: "DEMO-01",
  orientation: 0,
  laboratory: "Invented demo lab",
} as const;

export const MAPPING = { strain: 0, stress: 1, transverseStrain: 2 } as const;

export function uploadBody(text: string, extra: Record<string, unknown> = {}) {
  return { fileName: "demo-cyclic-tension.csv", text, mapping: MAPPING, meta: META, ...extra };
}

export async function recordCount(db: Db, teamId: string): Promise<number> {
  const rows = await db
    .select({ id: testRecords.id })
    .from(testRecords)
    .where(eq(testRecords.teamId, teamId));
  return rows.length;
}
