import { readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import {
  MAX_PROBLEMS,
  summarizeTeamExport,
  summarizeTeamExportText,
} from "@/lib/client/data/team-import-summary";
import { TEAM_EXPORT_FORMAT } from "@/lib/shared/validations/team-export";

// Issue 13 item 8: the import page says what a team export will create, and what is wrong with
// it in words (not a schema path), before anything is sent.

const DEMO_FILE = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
) as { parameterSets: Record<string, unknown>[] };
const T = "2026-01-05T10:00:00.000Z";
// A new object each time: a test that breaks one person must not break them all.
const alice = () => ({ email: "alice@example.test", name: "Alice" });

function revision(number: number, extra: Record<string, unknown> = {}) {
  return {
    number,
    author: alice(),
    message: "",
    file: DEMO_FILE,
    createdAt: T,
    review: { state: "draft", by: null, at: null },
    reviewEvents: [],
    comments: [] as ReturnType<typeof comment>[],
    ...extra,
  };
}

function comment(key: string, parentKey: string | null = null) {
  const base = { author: alice(), body: "Looks right", increment: null, createdAt: T };
  return { key, parentKey, ...base, editedAt: null };
}

/** Two scenarios (3 revisions, 3 comments, 1 approved revision with 2 history entries), 1 set. */
function exportFile() {
  const { id: _id, label: _label, ...values } = DEMO_FILE.parameterSets[0];
  return {
    format: TEAM_EXPORT_FORMAT,
    exportedAt: T,
    team: { name: "Demo team", slug: "demo" },
    parameterSets: [
      {
        name: "PA6-GF30 fitted",
        values,
        provenance: { kind: "typed" },
        createdBy: alice(),
        updatedBy: alice(),
        createdAt: T,
        updatedAt: T,
      },
    ],
    scenarios: [
      {
        name: "Plate rib",
        materialLabel: "PA6-GF30",
        tags: [],
        createdBy: alice(),
        createdAt: T,
        updatedAt: T,
        revisions: [
          revision(1, { comments: [comment("c1"), comment("c2", "c1")] }),
          revision(2, {
            review: { state: "approved", by: alice(), at: T },
            reviewEvents: [
              { from: "draft", to: "in_review", actor: alice(), note: "", at: T },
              { from: "in_review", to: "approved", actor: alice(), note: "ok", at: T },
            ],
          }),
        ],
      },
      {
        name: "Clip",
        materialLabel: "",
        tags: ["cyclic"],
        createdBy: null,
        createdAt: T,
        updatedAt: T,
        revisions: [revision(1, { comments: [comment("c9")] })],
      },
    ],
  };
}

describe("summarizeTeamExport", () => {
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
