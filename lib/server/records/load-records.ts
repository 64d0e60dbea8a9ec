import "server-only";

import type { Executor } from "@/db/client";
import { findRecordsForFit } from "@/db/queries/test-records";
import type { CouponOrientation } from "@/lib/calibration/micromechanics/coupon-orientation";
import type { TestRecordInput } from "@/lib/calibration/types";
import { notFound } from "@/lib/server/workspace/errors";

import { toTestRecordInput } from "../../shared/records/stored-points";

export interface LoadedRecord {
  id: string;
  name: string;
  input: TestRecordInput;
  couponOrientation: CouponOrientation | null;
}

/** The chosen records in the order asked; one foreign or unknown id fails the whole request. */
export async function loadRecordsForFit(
  db: Executor,
  teamId: string,
  ids: string[],
): Promise<LoadedRecord[]> {
  const unique = [...new Set(ids.map((id) => id.toLowerCase()))];
  const rows = await findRecordsForFit(db, teamId, unique);
  const byId = new Map(rows.map((r) => [r.id, r]));
  return unique.map((id) => {
    const row = byId.get(id);
    if (!row) throw notFound("test-record");
    return {
      id,
      name: row.name,
      input: toTestRecordInput(row),
      couponOrientation: row.couponOrientation ?? null,
    }; // the input carries the name for notes
  });
}
