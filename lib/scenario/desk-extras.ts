/**
 * The scenario file's top-level "desk" field: what the loading desk keeps beside the schema (the
 * path text as typed, the hidden sets, the test records drawn over the charts, the chart choices).
 * Files saved before the rename call it "workbench"; stored revisions stay as they were written,
 * so readers take either name. The schema leaves this field alone, so every reader here is
 * forgiving: a value it does not understand is dropped, never an error that would stop a file
 * from opening.
 */
import { isUuid } from "@/lib/shared/uuid";
import type { StrainComponent, StressComponent } from "@/lib/shared/quantity-symbols";

export function readDeskExtras(file: unknown): unknown {
  if (file === null || typeof file !== "object") return undefined;
  const record = file as { desk?: unknown; workbench?: unknown };
  return record.desk ?? record.workbench;
}

/** A test record drawn over the charts: its id in the team, and its name when chosen. */
export interface DeskOverlay {
  recordId: string;
  /** Shown when the record cannot be fetched (deleted, or the file came from another team). */
  name: string;
}

/** The stress–strain chart's pair and each other chart's horizontal axis, by chart key. */
export interface DeskCharts {
  stressStrain: { stress: StressComponent; strain: StrainComponent };
  horizontal: Record<string, HorizontalAxis>;
}

export type HorizontalAxis = "increment" | "damage" | StrainComponent | StressComponent;

export const DEFAULT_DESK_CHARTS: DeskCharts = {
  stressStrain: { stress: "sig11", strain: "eps11" },
  horizontal: {},
};

const STRAINS: readonly string[] = ["eps11", "eps22", "gam12"];
const STRESSES: readonly string[] = ["sig11", "sig22", "sig12"];
const HORIZONTAL: readonly string[] = ["increment", "damage", ...STRAINS, ...STRESSES];
// More than any team would lay over one chart; a longer list in a file is cut, not refused.
export const MAX_DESK_OVERLAYS = 24;
const MAX_NAME = 200;
const CHART_KEY = /^[a-z][a-z0-9-]{0,39}$/;

function asObject(value: unknown): Record<string, unknown> | null {
  return value !== null && typeof value === "object" && !Array.isArray(value)
    ? (value as Record<string, unknown>)
    : null;
}

/** The overlays of a "desk" field: valid record ids, each once, in the order chosen. */
export function readDeskOverlays(extras: unknown): DeskOverlay[] {
  const list = asObject(extras)?.overlays;
  if (!Array.isArray(list)) return [];
  const out: DeskOverlay[] = [];
  for (const item of list) {
    const o = asObject(item);
    if (!o || !isUuid(o.recordId)) continue;
    const recordId = o.recordId.toLowerCase();
    if (out.some((k) => k.recordId === recordId)) continue;
    const name = typeof o.name === "string" ? o.name.trim().slice(0, MAX_NAME) : "";
    out.push({ recordId, name });
    if (out.length === MAX_DESK_OVERLAYS) break;
  }
  return out;
}

/** The chart choices of a "desk" field; what is missing or unknown falls back to the default. */
export function readDeskCharts(extras: unknown): DeskCharts {
  const charts = asObject(asObject(extras)?.charts);
  const pair = asObject(charts?.stressStrain);
  const stress = STRESSES.includes(pair?.stress as string)
    ? (pair?.stress as StressComponent)
    : DEFAULT_DESK_CHARTS.stressStrain.stress;
  const strain = STRAINS.includes(pair?.strain as string)
    ? (pair?.strain as StrainComponent)
    : DEFAULT_DESK_CHARTS.stressStrain.strain;
  const horizontal: Record<string, HorizontalAxis> = {};
  for (const [key, value] of Object.entries(asObject(charts?.horizontal) ?? {})) {
    if (CHART_KEY.test(key) && HORIZONTAL.includes(value as string)) {
      horizontal[key] = value as HorizontalAxis;
    }
  }
  return { stressStrain: { stress, strain }, horizontal };
}
