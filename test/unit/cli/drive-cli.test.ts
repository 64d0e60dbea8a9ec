/**
 * The command-line driver end to end: the real script on the real core, spawned as a process
 * (scenario-file.md "Command-line driver": stdout only the output, exit codes, one stderr line).
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { rmSync } from "node:fs";
import { RESULT_COLUMNS } from "@/lib/mechanics/types";
import { DEMO_REQUIRED, demoFile } from "../scenario/fixtures";

const ROOT = path.resolve(__dirname, "../../..");
const DEMO = path.join(ROOT, "test/fixtures/demo-scenario.json");
const work = mkdtempSync(path.join(tmpdir(), "craquelure-drive-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function drive(...args: string[]) {
  const out = spawnSync(process.execPath, ["--import", "tsx", "scripts/drive.ts", ...args], {
    cwd: ROOT,
    encoding: "utf8",
    timeout: 60_000,
  });
  return { code: out.status, stdout: out.stdout, stderr: out.stderr };
}

function fileWith(name: string, json: unknown): string {
  const file = path.join(work, name);
  writeFileSync(file, typeof json === "string" ? json : JSON.stringify(json));
  return file;
}

// Each case starts Node with tsx: seconds on a busy two-core machine, so the cases get the
// spawn's own limit rather than vitest's 5 s default (a time limit, not a speed check).
describe("drive (spawned)", { timeout: 60_000 }, () => {
  it("prints the contract's header and one row per increment plus increment 0 for the demo file", () => {
    const { code, stdout, stderr } = drive(DEMO);
    expect(stderr).toBe("");
    expect(code).toBe(0);
    const lines = stdout.split("\n");
    expect(lines.pop()).toBe(""); // every line ends with \n
    expect(lines[0]).toBe(RESULT_COLUMNS.join(","));
    expect(lines).toHaveLength(1 + 1 + 100 + 50 + 100);
    const row = (increment: number) =>
      Object.fromEntries(
        lines[1 + increment].split(",").map((v, i) => [RESULT_COLUMNS[i], Number(v)]),
      );
    expect(row(0)).toMatchObject({ increment: 0, leg: 0, sig11: 0, failed: 0 });
    // spec D.4 table, closed form: ε11 = 0.010 → d1 = 0.2542425, σ11 = 71.60515 (7 digits).
    expect(row(100)).toMatchObject({ increment: 100, leg: 1, eps11: 0.01 });
    expect(row(100).d1).toBeCloseTo(0.2542425, 6);
    expect(row(100).sig11).toBeCloseTo(71.60515, 4);
    // spec D.5: unloaded to σ = 0, ε11 = alpha·d1 = 0.001271212.
    expect(row(150)).toMatchObject({ leg: 2, sig11: 0 });
    expect(row(150).eps11).toBeCloseTo(0.001271212, 8);
    // spec D.6: compression to −0.005 recovers E: σ = −68.98334.
    expect(row(250).sig11).toBeCloseTo(-68.98334, 4);
  });

  it("writes the contract's JSON with --format json and picks the set with --set", () => {
    const two = demoFile({
      parameterSets: [
        { ...DEMO_REQUIRED },
        { ...DEMO_REQUIRED, id: "soft", E1: 8000, E2: 8000, G12: 3000 },
      ],
    });
    const { code, stdout } = drive(fileWith("two.json", two), "--set", "soft", "--format", "json");
    expect(code).toBe(0);
    const parsed = JSON.parse(stdout);
    expect(parsed.set).toBe("soft");
    expect(Object.keys(parsed.columns)).toEqual([...RESULT_COLUMNS]);
    expect(parsed.columns.increment).toHaveLength(251);
    // first increment is elastic: σ11 = E1·ε11 with ε11 = 0.01/100 (uniaxial, spec C.3).
    expect(parsed.columns.sig11[1]).toBeCloseTo(8000 * 1e-4, 10);
    expect(parsed.status).toEqual({ failed: false, failMode: null, stoppedAtIncrement: null });
  });

  it("ends a failing point with failed = 1 and exit 0 (dcrit, onFailure stop)", () => {
    // spec D.4: d1 reaches dcrit = 0.45 at ε11 = 0.01537811, so a pull to 0.02 fails on the way.
    const pull = demoFile({
      path: {
        legs: [{ control: ["strain", "stress", "stress"], target: [0.02, 0, 0], increments: 200 }],
      },
    });
    const { code, stdout } = drive(fileWith("fail.json", pull), "--format", "json");
    expect(code).toBe(0);
    const { columns, status } = JSON.parse(stdout);
    expect(status.failed).toBe(true);
    expect(status.failMode).toBe("dcrit axis 1");
    const last = columns.increment.length - 1;
    expect(status.stoppedAtIncrement).toBe(last);
    expect(columns.failed[last]).toBe(1);
    expect(columns.eps11[last]).toBeGreaterThanOrEqual(0.01537811);
    expect(columns.eps11[last - 1]).toBeLessThan(0.01537811);
  });

  it('goes on past dcrit with onFailure "continue": every row written, failed stays 1', () => {
    const pull = demoFile({
      parameterSets: [{ ...DEMO_REQUIRED, onFailure: "continue" }],
      path: {
        legs: [
          { control: ["strain", "stress", "stress"], target: [0.02, 0, 0], increments: 200 },
          { control: ["strain", "stress", "stress"], target: [-0.005, 0, 0], increments: 50 },
        ],
      },
    });
    const { code, stdout } = drive(fileWith("continue.json", pull), "--format", "json");
    expect(code).toBe(0);
    const { columns, status } = JSON.parse(stdout);
    expect(columns.increment).toHaveLength(251);
    expect(status).toMatchObject({
      failed: true,
      failMode: "dcrit axis 1",
      stoppedAtIncrement: null,
    });
    const first = columns.failed.indexOf(1);
    expect(first).toBeGreaterThan(0);
    expect(columns.failed.slice(first).every((f: number) => f === 1)).toBe(true);
    // scenario-file.md: the row where d reaches dcrit already shows it at dmax (spec C.7).
    expect(columns.d1[first]).toBe(0.99);
    // Compression after failure is carried with the undamaged modulus (unilateral recovery).
    expect(columns.sig11[250]).toBeLessThan(0);
  });

  it.each([
    [
      "an invalid parameter",
      () => [fileWith("bad.json", demoFile({ parameterSets: [{ ...DEMO_REQUIRED, b: 1.5 }] }))],
      /parameterSets\[0\]\.b: must be in \[0, 1\]$/,
    ],
    [
      "a zero-increment leg",
      () => [
        fileWith(
          "zero.json",
          demoFile({
            path: {
              legs: [
                { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments: 0 },
              ],
            },
          }),
        ),
      ],
      /path\.legs\[0\]\.increments: must be an integer >= 1$/,
    ],
    ["invalid JSON", () => [fileWith("broken.json", "{ not json")], /broken\.json: not valid JSON/],
    [
      "a missing file",
      () => [path.join(work, "missing.json")],
      /cannot read .*missing\.json: no such file$/,
    ],
    ["an unknown set", () => [DEMO, "--set", "Q"], /--set: no parameter set "Q"/],
    ["a bad format", () => [DEMO, "--format", "xlsx"], /--format must be csv or json/],
    ["no arguments", () => [], /missing the scenario file/],
  ])("exits 2 with exactly one stderr line for %s", (_name, args, message) => {
    const { code, stdout, stderr } = drive(...args());
    expect(code).toBe(2);
    expect(stdout).toBe("");
    const lines = stderr.split("\n");
    expect(lines.pop()).toBe("");
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(message);
    expect(stderr).not.toMatch(/\n\s+at /); // no stack trace
  });
});
