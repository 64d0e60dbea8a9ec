import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";

import { ScenarioEditor } from "@/components/scenarios/scenario-editor";
import { defaultScenario } from "@/lib/client/loading-desk/default-scenario";
import { draftKey, serializeDraft } from "@/lib/client/loading-desk/kept-draft";
import { ResultsStore } from "@/lib/client/loading-desk/results-store";

// The solver worker, the plots and the team's data are outside this test: the desk's own state,
// the unsaved mark and the kept draft are what it checks.
vi.mock("next/navigation", () => ({ useRouter: () => ({ push: vi.fn(), refresh: vi.fn() }) }));
vi.mock("@/components/loading-desk/use-solver-runs", () => ({
  useSolverRuns: () => store,
}));
vi.mock("@/components/loading-desk/chart-grid", () => ({ ChartGrid: () => null }));
vi.mock("@/components/scenarios/record-overlay-picker", () => ({
  RecordOverlayPicker: () => null,
}));
vi.mock("@/lib/client/data/use-library-choices", () => ({ useLibraryChoices: () => [] }));
vi.mock("@/lib/client/data/use-test-records", () => ({
  useRecordOverlays: () => ({ overlays: [], loading: false, errors: [], missing: [] }),
}));
const mutate = vi.fn();
vi.mock("@/lib/client/data/use-save-revision", () => ({
  useSaveRevision: () => ({ mutate, isPending: false }),
}));

const store = new ResultsStore();
const saved = { ...defaultScenario(), name: "Beam, saved" };
const key = draftKey({ team: "lab", scenarioId: "s1", baseRevision: 3 });

function editor(editable = true) {
  return (
    <ScenarioEditor
      slug="lab"
      scenarioId="s1"
      number={3}
      file={saved}
      editable={editable}
      teamName="Lab team"
    />
  );
}

const nameField = () => screen.getByLabelText("Scenario name") as HTMLInputElement;

beforeEach(() => localStorage.clear());
afterEach(() => {
  cleanup();
  mutate.mockReset();
});

describe("unsaved changes and the kept draft (issue 13 item 3)", () => {
  it("marks the desk unsaved only once it differs from the revision, and keeps a draft", async () => {
    render(editor());
    expect(screen.queryByTestId("unsaved-mark")).toBeNull();
    fireEvent.change(nameField(), { target: { value: "Beam, edited" } });
    await waitFor(() =>
      expect(screen.getByTestId("unsaved-mark").textContent).toBe("Unsaved changes"),
    );
    const stored = JSON.parse(localStorage.getItem(key)!);
    expect(stored.file.name).toBe("Beam, edited");
    // Back to what the revision says: no mark, no draft.
    fireEvent.change(nameField(), { target: { value: "Beam, saved" } });
    await waitFor(() => expect(screen.queryByTestId("unsaved-mark")).toBeNull());
    expect(localStorage.getItem(key)).toBeNull();
  });

  it("offers a kept draft back and restores it", async () => {
    const at = new Date("2026-12-04T16:40:00.000Z");
    localStorage.setItem(key, serializeDraft({ ...saved, name: "Beam, kept" } as never, at));
    render(editor());
    const offer = screen.getByRole("region", { name: "Kept draft" });
    expect(offer.textContent).toMatch(/^A draft from .+ is kept in this browser:RestoreDiscard$/);
    expect(offer.querySelector("time")?.getAttribute("dateTime")).toBe(at.toISOString());
    // Opening the page does not overwrite the draft while it waits for an answer.
    expect(JSON.parse(localStorage.getItem(key)!).file.name).toBe("Beam, kept");
    expect(nameField().value).toBe("Beam, saved");
    fireEvent.click(screen.getByRole("button", { name: "Restore" }));
    await waitFor(() => expect(nameField().value).toBe("Beam, kept"));
    expect(screen.queryByRole("region", { name: "Kept draft" })).toBeNull();
    expect(screen.getByTestId("unsaved-mark")).toBeTruthy();
  });

  it("discards a kept draft", async () => {
    localStorage.setItem(
      key,
      serializeDraft({ ...saved, name: "Beam, kept" } as never, new Date()),
    );
    render(editor());
    fireEvent.click(screen.getByRole("button", { name: "Discard" }));
    await waitFor(() => expect(screen.queryByRole("region", { name: "Kept draft" })).toBeNull());
    expect(localStorage.getItem(key)).toBeNull();
    expect(nameField().value).toBe("Beam, saved");
    expect(screen.queryByTestId("unsaved-mark")).toBeNull();
  });

  it("ignores a corrupted draft and opens the revision", () => {
    localStorage.setItem(key, '{"version":1,"savedAt":"2026-12-04T16:40:00.000Z","file":{"name":3');
    render(editor());
    expect(screen.queryByRole("region", { name: "Kept draft" })).toBeNull();
    expect(nameField().value).toBe("Beam, saved");
    localStorage.setItem(key, JSON.stringify({ version: 1, savedAt: "soon", file: saved }));
    cleanup();
    render(editor());
    expect(screen.queryByRole("region", { name: "Kept draft" })).toBeNull();
  });

  it("clears the draft after a successful save", async () => {
    mutate.mockImplementation((_vars, options: { onSuccess: () => void }) => options.onSuccess());
    render(editor());
    fireEvent.change(nameField(), { target: { value: "Beam, edited" } });
    await waitFor(() => expect(localStorage.getItem(key)).not.toBeNull());
    fireEvent.click(screen.getByRole("button", { name: "Save revision" }));
    fireEvent.change(screen.getByLabelText(/message/i), { target: { value: "renamed" } });
    fireEvent.click(screen.getByRole("button", { name: "Save new revision" }));
    await waitFor(() => expect(mutate).toHaveBeenCalled());
    expect(localStorage.getItem(key)).toBeNull();
  });

  it("keeps no draft for a viewer", () => {
    localStorage.setItem(
      key,
      serializeDraft({ ...saved, name: "Beam, kept" } as never, new Date()),
    );
    render(editor(false));
    expect(screen.queryByRole("region", { name: "Kept draft" })).toBeNull();
    expect(screen.getByTestId("read-only-banner").textContent).toBe(
      "Read-only: editors and owners of Lab team can change this scenario.",
    );
  });
});
