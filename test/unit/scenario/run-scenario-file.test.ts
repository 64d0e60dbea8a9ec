/**
 * The one run function (run-scenario-file.ts) that the command line and the API share: the
 * outcome kinds and the output pieces, on the real core.
 */
import { readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { runPath } from "@/lib/mechanics/driver";
import { runScenarioFile, type PathRunner } from "@/lib/scenario/run-scenario-file";

const demo = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
);

function run(
  file: unknown,
  setId: string | null,
  format: "csv" | "json",
  runner: PathRunner = runPath,
) {
  const out: string[] = [];
  const outcome = runScenarioFile(
    file,
    { setId, format, fileName: "f.json" },
    runner,
    (t) => void out.push(t),
  );
  return { outcome, text: out.join("") };
}

describe("runScenarioFile", () => {
  it("writes the contract CSV, header first, one row per increment plus row 0", () => {
    const { outcome, text } = run(demo, null, "csv");
    expect(outcome).toMatchObject({ kind: "ok", setId: demo.parameterSets[0].id });
    const lines = text.trim().split("\n");
    expect(lines[0].startsWith("increment,leg,")).toBe(true);
    const increments = demo.path.legs.reduce(
      (n: number, l: { increments: number }) => n + l.increments,
      0,
    );
    expect(lines).toHaveLength(increments + 2);
  });

  it("writes JSON naming the set it ran", () => {
    const { outcome, text } = run(demo, null, "json");
    expect(outcome.kind).toBe("ok");
    expect(JSON.parse(text).set).toBe(demo.parameterSets[0].id);
  });

  it("names the file and the known sets when the set is not in it", () => {
    const { outcome, text } = run(demo, "nope", "csv");
    expect(outcome.kind).toBe("bad-input");
    if (outcome.kind !== "bad-input") return;
    expect(outcome.message).toContain('no parameter set "nope" in f.json');
    expect(outcome.message).toContain(JSON.stringify(demo.parameterSets[0].id));
    expect(text).toBe("");
  });

  it("reports a file that is not a scenario as bad input, prefixed with the file's name", () => {
    const { outcome } = run({ format: "nonsense" }, null, "csv");
    expect(outcome.kind).toBe("bad-input");
    if (outcome.kind === "bad-input") expect(outcome.message.startsWith("f.json: ")).toBe(true);
  });

  it("reports a core fault as internal on one line, and lets a deliberate stop through", () => {
    const faulty: PathRunner = () => {
      throw new Error("boom\nstack");
    };
    const { outcome } = run(demo, null, "csv", faulty);
    expect(outcome).toEqual({
      kind: "internal",
      message: `internal error while running set ${JSON.stringify(demo.parameterSets[0].id)}: boom`,
    });
    const stop: PathRunner = () => {
      throw Object.assign(new Error("budget"), { stopsRun: true });
    };
    expect(() => run(demo, null, "csv", stop)).toThrow("budget");
  });
});
