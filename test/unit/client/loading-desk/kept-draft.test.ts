import { describe, expect, it } from "vitest";
import {
  deskFileOf,
  differsFromSaved,
  draftKey,
  readDraft,
  serializeDraft,
} from "@/lib/client/loading-desk/kept-draft";
import { defaultScenario } from "@/lib/client/loading-desk/default-scenario";
import { leavesThePage } from "@/lib/client/loading-desk/leave-guard";

const saved = defaultScenario();
const at = new Date("2026-12-04T16:40:00.000Z");

describe("kept draft of unsaved desk edits (issue 13 item 3)", () => {
  it("keys a draft by team, scenario and base revision", () => {
    const key = draftKey({ team: "demo", scenarioId: "s1", baseRevision: 3 });
    expect(key).not.toBe(draftKey({ team: "demo", scenarioId: "s1", baseRevision: 4 }));
    expect(key).not.toBe(draftKey({ team: "other", scenarioId: "s1", baseRevision: 3 }));
    expect(key).not.toBe(draftKey({ team: "demo", scenarioId: "s2", baseRevision: 3 }));
  });

  it("sees no change on an untouched desk and a change in one value", () => {
    const untouched = deskFileOf(saved);
    expect(differsFromSaved(untouched, deskFileOf(saved))).toBe(false);
    const edited = {
      ...untouched,
      parameterSets: [{ ...untouched.parameterSets[0], Y0_1: 0.08 }],
    };
    expect(differsFromSaved(edited, untouched)).toBe(true);
    expect(differsFromSaved({ ...untouched, name: "other" }, untouched)).toBe(true);
  });

  it("ignores the key order of a rebuilt set", () => {
    const untouched = deskFileOf(saved);
    const reordered = Object.fromEntries(Object.entries(untouched.parameterSets[0]).reverse());
    expect(differsFromSaved({ ...untouched, parameterSets: [reordered as never] }, untouched)).toBe(
      false,
    );
  });

  it("reads back what it stored, with its time", () => {
    const edited = { ...deskFileOf(saved), name: "edited name" };
    const back = readDraft(serializeDraft(edited, at));
    expect(back?.savedAt.toISOString()).toBe(at.toISOString());
    expect(back?.scenario.name).toBe("edited name");
    expect(differsFromSaved(deskFileOf(back!.scenario), edited)).toBe(false);
  });

  it("ignores damaged, outdated or invalid stored drafts", () => {
    expect(readDraft(null)).toBeNull();
    expect(readDraft("{not json")).toBeNull();
    expect(readDraft(JSON.stringify({ version: 0, savedAt: at.toISOString(), file: saved }))).toBe(
      null,
    );
    expect(readDraft(JSON.stringify({ version: 1, savedAt: "yesterday", file: saved }))).toBe(null);
    const badSet = { ...saved, parameterSets: [{ ...saved.parameterSets[0], E1: "stiff" }] };
    expect(readDraft(JSON.stringify({ version: 1, savedAt: at.toISOString(), file: badSet }))).toBe(
      null,
    );
  });
});

describe("leave guard on links", () => {
  const here = "http://localhost:3000/teams/demo/scenarios/s1";
  const click = { target: "", download: false, modified: false };
  it("asks for another page of the product", () => {
    expect(leavesThePage({ ...click, href: "/teams/demo" }, here)).toBe(true);
    expect(leavesThePage({ ...click, href: "/teams/demo/scenarios/s1?rev=2" }, here)).toBe(true);
  });
  it("leaves new tabs, downloads, other sites and jumps within the page alone", () => {
    expect(leavesThePage({ ...click, href: "/teams/demo", target: "_blank" }, here)).toBe(false);
    expect(leavesThePage({ ...click, href: "/teams/demo", modified: true }, here)).toBe(false);
    expect(leavesThePage({ ...click, href: "/x.csv", download: true }, here)).toBe(false);
    expect(leavesThePage({ ...click, href: "https://example.org/" }, here)).toBe(false);
    expect(leavesThePage({ ...click, href: "#charts" }, here)).toBe(false);
  });
});
