import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ReadOnlyBanner } from "@/components/loading-desk/read-only-banner";
import { SetListPanel } from "@/components/loading-desk/set-list-panel";
import { PRESETS } from "@/lib/client/loading-desk/presets";
import type { SetEntry } from "@/lib/client/loading-desk/set-list";
import type { ResultsStore } from "@/lib/client/loading-desk/results-store";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

afterEach(cleanup);

const entries = [
  { set: { ...PRESETS[0].params, id: "A" } as ParameterSet, visible: true, color: "#336" },
] as unknown as SetEntry[];
// The panel only reads run status and subscribes for redraws; an empty store has no runs.
const store = {
  get: () => undefined,
  subscribe: () => () => {},
  version: () => 0,
} as unknown as ResultsStore;

describe("read-only loading desk (issue 13 item 5)", () => {
  it("names who may edit", () => {
    render(<ReadOnlyBanner teamName="Demo team" />);
    expect(screen.getByRole("note").textContent).toBe(
      "Read-only: editors and owners of Demo team can change this scenario.",
    );
  });

  it("shows no Editing chip and no set actions when read-only", () => {
    render(
      <SetListPanel
        entries={entries}
        activeId="A"
        readOnly
        store={store}
        onSelect={vi.fn()}
        dispatch={vi.fn()}
      />,
    );
    expect(screen.queryByText("Editing")).toBeNull();
    expect(screen.getByRole("button", { name: "Shown" })).toBeTruthy();
    expect(screen.queryByRole("button", { name: "Duplicate" })).toBeNull();
  });

  it("keeps the Editing chip for editors", () => {
    render(
      <SetListPanel
        entries={entries}
        activeId="A"
        store={store}
        onSelect={vi.fn()}
        dispatch={vi.fn()}
      />,
    );
    expect(screen.getByRole("button", { name: "Editing" })).toBeTruthy();
  });
});
