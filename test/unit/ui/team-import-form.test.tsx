import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { TeamImportForm } from "@/components/teams/team-import-form";

import { exportFile, exportFileWithRecords } from "../../fixtures/team-export";

// Issue 13 item 8: choose a team export, see what it will create, press Import, see the result.
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const EMPTY = { scenarios: 0, parameterSets: 0, testRecords: 0 };
const MB = 1024 * 1024;

function choose(content: unknown, name = "demo.team-export.json") {
  const text = typeof content === "string" ? content : JSON.stringify(content);
  const file = new File([text], name, { type: "application/json" });
  fireEvent.change(screen.getByLabelText("Team export file (.json)"), {
    target: { files: [file] },
  });
}

function cellsOf(table: HTMLElement): string[][] {
  return within(table)
    .getAllByRole("row")
    .map((row) => Array.from((row as HTMLTableRowElement).cells, (c) => c.textContent ?? ""));
}

function answer(status: number, body: unknown) {
  const fetchMock = vi.fn((_url: string, _init?: RequestInit) =>
    Promise.resolve(new Response(JSON.stringify(body), { status })),
  );
  vi.stubGlobal("fetch", fetchMock);
  return fetchMock;
}

describe("TeamImportForm", () => {
  it("shows what the file will create, then posts it and says what was created", async () => {
    const fetchMock = answer(201, {
      scenarios: 2,
      revisions: 3,
      comments: 3,
      parameterSets: 1,
      testRecords: 0,
      fits: 0,
      notes: [],
    });
    render(<TeamImportForm teamSlug="new-team" held={EMPTY} maxBytes={64 * MB} />);
    expect(screen.queryByRole("button", { name: "Import" })).toBeNull();
    choose(exportFile());

    const totals = await screen.findByRole("table", { name: "What the import will create" });
    expect(cellsOf(totals)).toEqual([
      ["Scenarios", "2"],
      ["Revisions", "3"],
      ["Parameter sets", "1"],
      ["Test records (with their original files)", "0"],
      ["Fits", "0"],
      ["Comments", "3"],
      ["Revisions with a review", "1"],
      ["Review history entries", "2"],
    ]);
    const perScenario = screen.getByRole("table", { name: "Scenarios in the file" });
    expect(within(perScenario).getByRole("row", { name: /Plate rib/ }).textContent).toBe(
      "Plate rib221",
    );
    expect(screen.getByText(/keep the names written in the file as text/)).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();

    fireEvent.click(screen.getByRole("button", { name: "Import" }));
    const done = await screen.findByText(/^Imported /);
    expect(done.textContent).toContain(
      "Imported 2 scenarios, 3 revisions, 1 parameter set, 3 comments, 0 test records, 0 fits.",
    );
    expect(screen.getByRole("link", { name: "Open the scenarios" }).getAttribute("href")).toBe(
      "/teams/new-team/scenarios",
    );
    expect(fetchMock).toHaveBeenCalledTimes(1);
    const [url, init] = fetchMock.mock.calls[0];
    expect(url).toBe("/api/v1/teams/new-team/import");
    expect(init?.method).toBe("POST");
    const sent = JSON.parse(String(init?.body)) as ReturnType<typeof exportFile>;
    expect(sent.scenarios.map((s) => s.name)).toEqual(["Plate rib", "Clip"]);
    expect(screen.queryByRole("button", { name: "Import" })).toBeNull();
  });

  it("shows the server's message when the import is refused", async () => {
    answer(409, {
      error: {
        code: "conflict:not-empty",
        message: "Import into a new, empty team: this one has scenarios or parameter sets already.",
      },
    });
    render(<TeamImportForm teamSlug="t" held={EMPTY} maxBytes={64 * MB} />);
    choose(exportFile());
    fireEvent.click(await screen.findByRole("button", { name: "Import" }));
    expect((await screen.findByRole("alert")).textContent).toBe(
      "Import into a new, empty team: this one has scenarios or parameter sets already.",
    );
  });

  it("lists the file's problems in words and offers no Import", async () => {
    const file = exportFile();
    delete (file.scenarios[0].revisions[1] as { file?: unknown }).file;
    render(<TeamImportForm teamSlug="t" held={EMPTY} maxBytes={64 * MB} />);
    choose(file);
    const problems = await screen.findByTestId("import-problems");
    expect(
      within(problems)
        .getAllByRole("listitem")
        .map((li) => li.textContent),
    ).toEqual(["Revision 2 of 'Plate rib' has no scenario file."]);
    expect(screen.queryByRole("button", { name: "Import" })).toBeNull();
  });

  it("refuses a file over the size limit before reading it", async () => {
    render(<TeamImportForm teamSlug="t" held={EMPTY} maxBytes={1024} />);
    choose(exportFile());
    expect((await screen.findByTestId("import-problems")).textContent).toContain(
      "The file is larger than 1 KB, the most an import takes.",
    );
  });

  it("counts the file's test records and fits and says which overlay it leaves out", async () => {
    render(<TeamImportForm teamSlug="t" held={EMPTY} maxBytes={64 * MB} />);
    choose(exportFileWithRecords());
    const totals = await screen.findByRole("table", { name: "What the import will create" });
    expect(cellsOf(totals)).toContainEqual(["Test records (with their original files)", "1"]);
    expect(cellsOf(totals)).toContainEqual(["Fits", "1"]);
    expect(screen.getByText("Test records: T-01.")).toBeTruthy();
    const note = screen.getByRole("note", { name: "Left out by the import" });
    expect(note.textContent).toContain(
      "Revision 2 of 'Plate rib' drew 'T-77 elsewhere' over its charts; that record is not in the file, so the overlay is left out.",
    );
  });

  it("tells a team that holds work that it must be empty, before any upload", async () => {
    const fetchMock = answer(201, {});
    render(
      <TeamImportForm
        teamSlug="t"
        held={{ scenarios: 3, parameterSets: 1, testRecords: 2 }}
        maxBytes={64 * MB}
      />,
    );
    expect(screen.getByRole("alert").textContent).toContain(
      "An import goes into an empty team, and this one holds 3 scenarios, 1 parameter set and 2 test records.",
    );
    choose(exportFile());
    await screen.findByTestId("import-summary");
    expect(screen.queryByRole("button", { name: "Import" })).toBeNull();
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
