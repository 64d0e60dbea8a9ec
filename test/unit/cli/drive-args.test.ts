/** Arguments of the command-line driver (scenario-file.md "Command-line driver"). */
import { describe, expect, it } from "vitest";
import { parseDriveArgs } from "@/lib/scenario/drive-args";

describe("parseDriveArgs", () => {
  it("defaults to the first set and csv", () => {
    expect(parseDriveArgs(["s.json"])).toEqual({
      kind: "run",
      file: "s.json",
      setId: null,
      format: "csv",
    });
  });

  it("reads --set and --format in either spelling and any order", () => {
    const expected = { kind: "run", file: "s.json", setId: "B", format: "json" };
    expect(parseDriveArgs(["s.json", "--set", "B", "--format", "json"])).toEqual(expected);
    expect(parseDriveArgs(["--format=json", "--set=B", "s.json"])).toEqual(expected);
  });

  it("treats everything after -- as a file name", () => {
    expect(parseDriveArgs(["--", "--odd-name.json"])).toMatchObject({
      kind: "run",
      file: "--odd-name.json",
    });
  });

  it.each([
    [[], /^missing the scenario file; usage:/],
    [["a.json", "b.json"], /^expected one scenario file, got 2/],
    [["a.json", "--format", "xml"], /^--format must be csv or json, got "xml"/],
    [["a.json", "--format"], /^option --format needs a value/],
    [["a.json", "--set"], /^option --set needs a value/],
    [["a.json", "--set="], /^option --set needs a value/],
    [["a.json", "--set", "--format", "csv"], /^option --set needs a value/],
    [["a.json", "--set", "A", "--set", "B"], /^option --set given twice/],
    [["a.json", "--rows", "5"], /^unknown option --rows/],
  ])("rejects %j with one clear line", (argv, message) => {
    const result = parseDriveArgs(argv);
    expect(result.kind).toBe("error");
    if (result.kind === "error") {
      expect(result.message).toMatch(message);
      expect(result.message.includes("\n")).toBe(false);
    }
  });

  it("asks for help with --help or -h", () => {
    expect(parseDriveArgs(["--help"])).toEqual({ kind: "help" });
    expect(parseDriveArgs(["x.json", "-h"])).toEqual({ kind: "help" });
  });
});
