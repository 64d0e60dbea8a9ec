/**
 * Structured difference of two scenario files (parsed, defaults filled): parameter sets
 * matched by id, path legs compared by position. Pure, so the loading desk can use it too.
 */
import type { Scenario } from "@/lib/scenario/scenario-schema";

export interface FieldChange {
  field: string;
  from: unknown;
  to: unknown;
}

export type SetDiff =
  | { id: string; kind: "added"; label: string }
  | { id: string; kind: "removed"; label: string }
  | { id: string; kind: "changed"; label: string; fields: FieldChange[] };

export type LegDiff =
  | { index: number; kind: "added"; to: unknown }
  | { index: number; kind: "removed"; from: unknown }
  | { index: number; kind: "changed"; fields: FieldChange[] };

export interface RevisionDiff {
  name: { from: string; to: string } | null;
  parameterSets: SetDiff[];
  path: {
    legs: LegDiff[];
    legCount: { from: number; to: number };
    totalIncrements: { from: number; to: number };
    generatorsChanged: boolean;
  };
  identical: boolean;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

function fieldChanges(left: object, right: object): FieldChange[] {
  const a = left as Record<string, unknown>;
  const b = right as Record<string, unknown>;
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])];
  return keys
    .filter((k) => !same(a[k], b[k]))
    .map((field) => ({ field, from: a[field] ?? null, to: b[field] ?? null }));
}

function diffSets(from: Scenario, to: Scenario): SetDiff[] {
  const before = new Map(from.parameterSets.map((s) => [s.id, s]));
  const after = new Map(to.parameterSets.map((s) => [s.id, s]));
  const out: SetDiff[] = [];
  for (const [id, a] of before) {
    const b = after.get(id);
    if (!b) out.push({ id, kind: "removed", label: a.label });
    else {
      const fields = fieldChanges(a, b);
      if (fields.length) out.push({ id, kind: "changed", label: b.label, fields });
    }
  }
  for (const [id, b] of after) if (!before.has(id)) out.push({ id, kind: "added", label: b.label });
  return out;
}

function diffLegs(from: Scenario, to: Scenario): LegDiff[] {
  const a = from.path.legs;
  const b = to.path.legs;
  const out: LegDiff[] = [];
  for (let i = 0; i < Math.max(a.length, b.length); i++) {
    if (i >= a.length) out.push({ index: i, kind: "added", to: b[i] });
    else if (i >= b.length) out.push({ index: i, kind: "removed", from: a[i] });
    else {
      const fields = fieldChanges(a[i], b[i]);
      if (fields.length) out.push({ index: i, kind: "changed", fields });
    }
  }
  return out;
}

const total = (s: Scenario) => s.path.legs.reduce((sum, leg) => sum + leg.increments, 0);

export function diffScenarios(from: Scenario, to: Scenario): RevisionDiff {
  const parameterSets = diffSets(from, to);
  const legs = diffLegs(from, to);
  const generatorsChanged = !same(from.path.generators, to.path.generators);
  const name = from.name === to.name ? null : { from: from.name, to: to.name };
  return {
    name,
    parameterSets,
    path: {
      legs,
      legCount: { from: from.path.legs.length, to: to.path.legs.length },
      totalIncrements: { from: total(from), to: total(to) },
      generatorsChanged,
    },
    identical: !name && parameterSets.length === 0 && legs.length === 0 && !generatorsChanged,
  };
}
