/**
 * Version 1 of the contract (scenario-file.md) called the increment column `step` and the status
 * field `stoppedAtStep`. A step means a load step of many increments to finite-element users, so
 * version 2 says `increment` / `stoppedAtIncrement`; what we wrote before keeps reading.
 */
import type { ResultColumn, RunStatus } from "@/lib/mechanics/types";

/** Old column name → the contract's current one. */
export const VERSION1_COLUMN_NAMES: Readonly<Record<string, ResultColumn>> = { step: "increment" };

type StoredStatus = Omit<RunStatus, "stoppedAtIncrement"> & {
  stoppedAtIncrement?: number | null;
  stoppedAtStep?: number | null;
};

/** A run status as stored (either version), with the current field name only. */
export function runStatusOnRead(stored: StoredStatus): RunStatus;
export function runStatusOnRead(stored: StoredStatus | null): RunStatus | null;
export function runStatusOnRead(stored: StoredStatus | null): RunStatus | null {
  if (stored === null) return null;
  const { stoppedAtStep, stoppedAtIncrement, ...rest } = stored;
  return { ...rest, stoppedAtIncrement: stoppedAtIncrement ?? stoppedAtStep ?? null };
}
