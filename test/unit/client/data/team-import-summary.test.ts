import { describe, expect, it } from "vitest";

import {
  MAX_PROBLEMS,
  summarizeTeamExport,
  summarizeTeamExportText,
} from "@/lib/client/data/team-import-summary";
import { TEAM_EXPORT_FORMAT } from "@/lib/shared/validations/team-export";

import {
  comment,
  DEMO_FILE,
  exportFile,
  exportFileWithRecords,
  revision,
  T,
} from "../../../fixtures/team-export";

// Issue 13 item 8: the import page says what a team export will create, and what is wrong with
// it in words (not a schema path), before anything is sent.

describe("summarizeTeamExport", () => {
  it("counts test records and fits, and says which overlay will be left out", () => {
    const summary = summarizeTeamExport(exportFileWithRecords());
    if (!summary.ok) throw new Error(summary.problems.join("\n"));
    expect(summary.counts).toMatchObject({ testRecords: 1, fits: 1, scenarios: 2 });
    expect(summary.testRecords).toEqual(["T-01"]);
    expect(summary.notes).toEqual([
      "Revision 2 of 'Plate rib' drew 'T-77 elsewhere' over its charts; that record is not in the file, so the overlay is left out.",
    ]);
    // A file of the old shape has none of them, and nothing is left out.
    const old = summarizeTeamExport(exportFile());
    expect(old.ok && [old.testRecords, old.notes]).toEqual([[], []]);
  });

  it("names a test record whose field is wrong, and a fit whose values are not valid", () => {
    const file = exportFileWithRecords();
    (file.testRecords[0] as { specimenId: unknown }).specimenId = 7;
    (file.fits[0].params as { E1: number }).E1 = -1;
    const summary = summarizeTeamExport(file);
    expect(summary).toEqual({
      ok: false,
      problems: ["Test record 'T-01': the specimen id should be text."],
    });
    const values = exportFileWithRecords();
    (values.fits[0].params as { E1: number }).E1 = -1;
    const second = summarizeTeamExport(values);
    expect(second.ok).toBe(false);
    expect(!second.ok && second.problems[0]).toMatch(/^Fit 1 has values that are not valid \(E1: /);
  });

  it("counts what will be created, per scenario and in total", () => {
    const summary = summarizeTeamExport(exportFile());
    if (!summary.ok) throw new Error(summary.problems.join("\n"));
    expect(summary.from).toEqual({ name: "Demo team", slug: "demo", exportedAt: T });
    expect(summary.counts).toEqual({
      scenarios: 2,
      revisions: 3,
      parameterSets: 1,
      comments: 3,
      reviews: 1,
      reviewEvents: 2,
      testRecords: 0,
      fits: 0,
    });
    expect(summary.scenarios).toEqual([
      { name: "Plate rib", revisions: 2, comments: 2, reviews: 1 },
      { name: "Clip", revisions: 1, comments: 1, reviews: 0 },
    ]);
    expect(summary.parameterSets).toEqual(["PA6-GF30 fitted"]);
  });

  it("names a revision without a scenario file by its number and scenario", () => {
    const file = exportFile();
    delete (file.scenarios[0].revisions[1] as { file?: unknown }).file;
    const summary = summarizeTeamExport(file);
    expect(summary).toEqual({
      ok: false,
      problems: ["Revision 2 of 'Plate rib' has no scenario file."],
    });
  });

  it("says where a comment's field is wrong, without a schema path", () => {
    const file = exportFile();
    (file.scenarios[1].revisions[0].comments[0] as { increment: unknown }).increment = -4;
    const summary = summarizeTeamExport(file);
    if (summary.ok) throw new Error("should fail");
    expect(summary.problems).toHaveLength(1);
    expect(summary.problems[0]).toBe(
      "Comment 1 on revision 1 of 'Clip': the increment should be at least 0.",
    );
    expect(summary.problems[0]).not.toMatch(/scenarios\[|\.revisions/);
  });

  it("names a person's field on a parameter set", () => {
    const file = exportFile();
    (file.parameterSets[0].createdBy as { email: unknown }).email = 7;
    const summary = summarizeTeamExport(file);
    if (summary.ok) throw new Error("should fail");
    expect(summary.problems[0]).toMatch(
      /^Parameter set 'PA6-GF30 fitted': the creator's e-mail should be text\.$/,
    );
  });

  it("says only that another kind of file is not a team export", () => {
    expect(summarizeTeamExport(DEMO_FILE)).toEqual({
      ok: false,
      problems: [`This is not a Craquelure team export (${TEAM_EXPORT_FORMAT}).`],
    });
  });

  it("finds what the shape cannot: bad scenario file, repeated numbers and names, lost replies", () => {
    const file = exportFile();
    file.scenarios[0].revisions[1].number = 1;
    file.scenarios[1].revisions[0].file = { ...DEMO_FILE, path: "not a path" } as never;
    file.scenarios[1].revisions[0].comments = [comment("c9", "gone")];
    file.parameterSets.push({ ...file.parameterSets[0] });
    file.parameterSets[1].values = { ...file.parameterSets[1].values, E1: -1 };
    const summary = summarizeTeamExport(file);
    if (summary.ok) throw new Error("should fail");
    expect(summary.problems).toEqual([
      "Two parameter sets are named 'PA6-GF30 fitted'.",
      expect.stringMatching(
        /^Parameter set 'PA6-GF30 fitted' has values that are not valid \(E1: /,
      ),
      "Revision 1 of 'Plate rib' appears twice.",
      expect.stringMatching(/^Revision 1 of 'Clip' has a scenario file that is not valid \(path/),
      "Comment 1 on revision 1 of 'Clip' replies to a comment that is not in the file.",
    ]);
  });

  it("shows at most MAX_PROBLEMS problems and counts the rest", () => {
    const file = exportFile();
    const many = Array.from({ length: MAX_PROBLEMS + 3 }, (_, i) => revision(i + 3));
    for (const r of many) delete (r as { file?: unknown }).file;
    file.scenarios[1].revisions.push(...many);
    const summary = summarizeTeamExport(file);
    if (summary.ok) throw new Error("should fail");
    expect(summary.problems).toHaveLength(MAX_PROBLEMS + 1);
    expect(summary.problems[0]).toBe("Revision 3 of 'Clip' has no scenario file.");
    expect(summary.problems.at(-1)).toBe("… and 3 more problems.");
  });
});

describe("summarizeTeamExportText", () => {
  it("says a file that is not JSON is not JSON", () => {
    expect(summarizeTeamExportText("format,name\n1,2")).toEqual({
      ok: false,
      problems: ["The file is not JSON; choose the file the team export downloaded."],
    });
  });

  it("reads a JSON export", () => {
    expect(summarizeTeamExportText(JSON.stringify(exportFile())).ok).toBe(true);
  });
});
