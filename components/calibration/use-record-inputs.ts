"use client";

import type { TestRecordInput } from "@/lib/calibration/types";
import type { TestRecordResponse } from "@/lib/server/records/records";
import { toTestRecordInput } from "@/lib/shared/records/stored-points";

/** Loads the chosen records' points for the fit worker (the browser replays them). */
export async function loadRecordInputs(slug: string, ids: string[]): Promise<TestRecordInput[]> {
  return Promise.all(
    ids.map(async (id) => {
      const res = await fetch(`/api/v1/teams/${slug}/test-records/${id}`);
      const json = await res.json();
      if (!res.ok) throw new Error(json?.error?.message ?? "A test record could not be loaded.");
      return toTestRecordInput(json as TestRecordResponse); // with its name, for the notes
    }),
  );
}
