import { describe, expect, it } from "vitest";

import { PRESETS } from "@/lib/client/loading-desk/presets";
import { fromScenario } from "@/lib/client/loading-desk/scenario-state";
import { pathTextInCurrentWords } from "@/lib/scenario/path-text/convert-version1";
import { expandPathDoc } from "@/lib/scenario/path-text/path-doc";
import { parsePathText } from "@/lib/scenario/path-text/parse-path-text";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import stored from "@/test/fixtures/version1-path-texts.json";

function legsOf(text: string) {
  const r = parsePathText(text);
  if (!r.ok) throw new Error(`${JSON.stringify(text)}: ${r.errors[0].message}`);
  return expandPathDoc(r.doc);
}

describe("path texts saved by earlier revisions (notation version 1)", () => {
  it("the fixture holds old texts", () => {
    expect(stored.texts.length).toBeGreaterThan(5);
    for (const { text } of stored.texts) expect(text).toMatch(/\b[esg](11|22|12)=.* in \d/);
  });

  it.each(stored.texts.map((t) => [t.from, t.text]))(
    "%s opens in the current words with the same legs",
    (_from, text) => {
      const file = {
        format: "craquelure.scenario/1",
        name: "stored revision",
        parameterSets: [PRESETS[0].params],
        path: { legs: legsOf(text) },
        workbench: { pathText: text },
      };
      const parsed = parseScenarioFile(JSON.parse(JSON.stringify(file)));
      if (!parsed.ok) throw new Error(parsed.errors.join("; "));
      const opened = fromScenario(parsed.scenario, file).pathText;
      expect(opened).toBe(pathTextInCurrentWords(text));
      expect(opened).not.toMatch(/\b[esg](11|22|12)=|(%|\d) in \d/);
      expect(legsOf(opened)).toEqual(parsed.scenario.path.legs);
    },
  );

  it("converts names and the increments word, and leaves notes and layout alone", () => {
    expect(
      pathTextInCurrentWords("repeat 2 grow 1\n  e11=1% in 10   # s11 in 5\nend\r\ns12=0 in 3"),
    ).toBe("repeat 2 grow 1\n  ε11=1% over 10   # s11 in 5\nend\r\nσ12=0 over 3");
    expect(pathTextInCurrentWords("γ12=1% over 5")).toBe("γ12=1% over 5");
  });
});
