/**
 * The driver's contract in process, with a stand-in for the core so only the command's own
 * behaviour is under test: exit codes, one-line stderr, stdout only the output.
 * (drive-cli.test.ts runs the real script on the real core.)
 */
import { describe, expect, it } from "vitest";
import { RESULT_COLUMNS, type ResultColumns, type RunStatus } from "@/lib/mechanics/types";
import { runDriveCommand, type PathRunner } from "@/lib/scenario/drive-command";
import { DEMO_REQUIRED, demoFile } from "../scenario/fixtures";

const OK_STATUS: RunStatus = {
  failed: false,
  failMode: null,
  stoppedAtIncrement: null,
  warnings: [],
};

/** A core stand-in: one row per increment plus row 0, sig11 = E1 so the chosen set shows. */
function fakeRunner(status: RunStatus = OK_STATUS): PathRunner & { calls: unknown[] } {
  const calls: unknown[] = [];
  const run = ((params, legs) => {
    calls.push({ params, legs });
    const rows = 1 + legs.reduce((n, leg) => n + leg.increments, 0);
    const columns = {} as ResultColumns;
    for (const name of RESULT_COLUMNS) columns[name] = new Float64Array(rows);
    columns.sig11.fill(params.E1);
    columns.increment.forEach((_, i) => (columns.increment[i] = i));
    return { rows, columns, status };
  }) as PathRunner & { calls: unknown[] };
  run.calls = calls;
  return run;
}

function drive(argv: string[], files: Record<string, string>, run: PathRunner = fakeRunner()) {
  let stdout = "";
  const stderr: string[] = [];
  const code = runDriveCommand(
    argv,
    {
      readFile: (p) => {
        if (p === "dir")
          throw Object.assign(new Error("EISDIR: illegal operation"), { code: "EISDIR" });
        if (!(p in files))
          throw Object.assign(new Error(`ENOENT: no such file, open '${p}'`), { code: "ENOENT" });
        return files[p];
      },
      stdout: (text) => (stdout += text),
      stderr: (line) => stderr.push(line),
    },
    run,
  );
  return { code, stdout, stderr };
}

const twoSets = JSON.stringify(
  demoFile({
    parameterSets: [{ ...DEMO_REQUIRED }, { ...DEMO_REQUIRED, id: "soft", E1: 8000, E2: 8000 }],
  }),
);

describe("runDriveCommand", () => {
  it("runs the first set by default and prints header + 1 + Σ increments rows", () => {
    const run = fakeRunner();
    const { code, stdout, stderr } = drive(["s.json"], { "s.json": twoSets }, run);
    expect(code).toBe(0);
    expect(stderr).toEqual([]);
    const lines = stdout.trimEnd().split("\n");
    expect(lines[0]).toBe(RESULT_COLUMNS.join(","));
    expect(lines).toHaveLength(1 + 251);
    // The core gets the law's parameters only, with the A.3 defaults filled in.
    expect(run.calls[0]).toMatchObject({ params: { E1: 11000, k6: 1, dmax: 0.99, Xc: null } });
    expect(run.calls[0]).not.toHaveProperty("params.id");
  });

  it("runs the set named by --set and writes JSON with --format json", () => {
    const { code, stdout } = drive(["s.json", "--set", "soft", "--format", "json"], {
      "s.json": twoSets,
    });
    expect(code).toBe(0);
    const parsed = JSON.parse(stdout);
    expect(parsed.set).toBe("soft");
    expect(parsed.columns.sig11[0]).toBe(8000);
  });

  it("exits 0 for a failed point and says so in the status, not on stderr", () => {
    const failed: RunStatus = {
      failed: true,
      failMode: "limit load",
      stoppedAtIncrement: 3,
      warnings: [],
    };
    const { code, stdout, stderr } = drive(
      ["s.json", "--format=json"],
      { "s.json": twoSets },
      fakeRunner(failed),
    );
    expect(code).toBe(0);
    expect(stderr).toEqual([]);
    expect(JSON.parse(stdout).status).toEqual({
      failed: true,
      failMode: "limit load",
      stoppedAtIncrement: 3,
    });
  });

  it("prints the core's warnings on stderr and still exits 0", () => {
    const warned = { ...OK_STATUS, warnings: ["compression strength exceeded"] };
    const { code, stderr } = drive(["s.json"], { "s.json": twoSets }, fakeRunner(warned));
    expect(code).toBe(0);
    expect(stderr).toEqual(["warning: compression strength exceeded"]);
  });

  const badCases: [string, string[], Record<string, string>, RegExp][] = [
    ["a missing file", ["nope.json"], {}, /^cannot read nope\.json: no such file$/],
    ["a directory", ["dir"], {}, /^cannot read dir: it is a directory$/],
    [
      "invalid JSON",
      ["s.json"],
      { "s.json": '{\n  "format": ,\n}' },
      /^s\.json: not valid JSON \(Unexpected token/,
    ],
    [
      "JSON cut short",
      ["s.json"],
      { "s.json": '{\n  "a": 1\n  "b"' },
      /^s\.json: not valid JSON at line 3, column 3 /,
    ],
    ["an empty file", ["s.json"], { "s.json": "" }, /^s\.json: not valid JSON/],
    [
      "an unknown set",
      ["s.json", "--set", "Z"],
      { "s.json": twoSets },
      /^--set: no parameter set "Z" in s\.json \(it has "A", "soft"\)$/,
    ],
    [
      "bad arguments",
      ["s.json", "--format", "xml"],
      { "s.json": twoSets },
      /^--format must be csv or json/,
    ],
    [
      "an invalid parameter",
      ["s.json"],
      { "s.json": JSON.stringify(demoFile({ parameterSets: [{ ...DEMO_REQUIRED, a1: 5 }] })) },
      /^s\.json: parameterSets\[0\]\.a1: must be > 0 and a1·sqrt\(Y0_1\) < 1$/,
    ],
  ];
  it.each(badCases)(
    "exits 2 with one line for %s, and prints nothing on stdout",
    (_name, argv, files, message) => {
      const { code, stdout, stderr } = drive(argv, files);
      expect(code).toBe(2);
      expect(stdout).toBe("");
      expect(stderr).toHaveLength(1);
      expect(stderr[0]).toMatch(message);
    },
  );

  it("joins many problems of one file into one line", () => {
    const sets = [{ ...DEMO_REQUIRED, E1: -1, E2: -1, G12: -1, b: 5, k6: 9, alpha: 1, beta: 1 }];
    const { code, stderr } = drive(["s.json"], {
      "s.json": JSON.stringify(demoFile({ parameterSets: sets })),
    });
    expect(code).toBe(2);
    expect(stderr).toHaveLength(1);
    expect(stderr[0]).toMatch(/^s\.json: parameterSets\[0\]\.E1: must be > 0; .*; and 2 more$/);
  });

  it("turns an exception from the core into exit 1 and one line, without a stack trace", () => {
    const broken: PathRunner = () => {
      throw new Error("matrix is singular\n    at solve (x.ts:1:1)");
    };
    const { code, stderr } = drive(["s.json"], { "s.json": twoSets }, broken);
    expect(code).toBe(1);
    expect(stderr).toEqual(['internal error while running set "A": matrix is singular']);
  });
});
