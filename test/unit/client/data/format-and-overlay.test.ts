import { describe, expect, it } from "vitest";

import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { defaultScenario } from "@/lib/client/loading-desk/default-scenario";
import { formatValue, formatWhen } from "@/lib/client/data/format";
import { overlayRevisions, samePath } from "@/lib/client/data/overlay";

function scenarioWith(label: string, E1: number) {
  const file = defaultScenario();
  file.parameterSets = file.parameterSets.map((s) => ({ ...s, label, E1 }));
  const parsed = parseScenarioFile(file);
  if (!parsed.ok) throw new Error(parsed.errors.join("; "));
  return parsed.scenario;
}

describe("overlay of two revisions", () => {
  it("carries both revisions' sets with unique ids and 'rev N · set' labels, and validates", () => {
    const a = scenarioWith("SMC", 11000);
    const b = scenarioWith("SMC", 12000);
    const merged = overlayRevisions({ number: 2, scenario: a }, { number: 1, scenario: b });
    expect(merged.parameterSets.map((s) => s.label)).toEqual(["rev 2 · SMC", "rev 1 · SMC"]);
    expect(merged.parameterSets.map((s) => s.E1)).toEqual([11000, 12000]);
    expect(new Set(merged.parameterSets.map((s) => s.id)).size).toBe(2);
    expect(parseScenarioFile(merged).ok).toBe(true);
    expect(samePath(a, b)).toBe(true);
    expect(merged.desk).toBeUndefined();
  });

  it("keeps the base's path text so repeat blocks stay readable", () => {
    const a = scenarioWith("SMC", 11000);
    const text = "repeat 2 grow 1\n  ε11=0.2% over 60\n  σ11=0 over 60\nend\n";
    const merged = overlayRevisions(
      { number: 3, scenario: a, desk: { pathText: text, hidden: ["A"] } },
      { number: 2, scenario: a },
    );
    expect(merged.desk).toEqual({ pathText: text, hidden: [] });
  });
});

describe("formatting", () => {
  it("prints times in UTC to the minute and values to four digits", () => {
    expect(formatWhen("2026-03-04T05:06:07.000Z")).toBe("2026-03-04 05:06 UTC");
    expect(formatWhen(null)).toBe("—");
    expect(formatValue(4230.769)).toBe("4231");
    expect(formatValue(0.005)).toBe("0.005");
    expect(formatValue(0.0001)).toBe("1e-4");
    expect(formatValue(null)).toBe("—");
  });
});
