import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ParameterForm } from "@/components/loading-desk/parameter-form";
import { PathEditor } from "@/components/loading-desk/path-editor";
import { PathTable } from "@/components/loading-desk/path-table";
import { ReadOnlyBanner } from "@/components/loading-desk/read-only-banner";
import { SetListPanel } from "@/components/loading-desk/set-list-panel";
import { PRESETS } from "@/lib/client/loading-desk/presets";
import type { SetEntry } from "@/lib/client/loading-desk/set-list";
import type { ResultsStore } from "@/lib/client/loading-desk/results-store";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import type { PathDoc } from "@/lib/scenario/path-text/path-doc";

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

function renderSetList(readOnly: boolean) {
  render(
    <SetListPanel
      entries={entries}
      activeId="A"
      readOnly={readOnly}
      store={store}
      onSelect={vi.fn()}
      dispatch={vi.fn()}
    />,
  );
}

describe("read-only loading desk (issue 13 item 5)", () => {
  it("names who may edit", () => {
    render(<ReadOnlyBanner teamName="Demo team" />);
    expect(screen.getByRole("note").textContent).toBe(
      "Read-only: editors and owners of Demo team can change this scenario.",
    );
  });

  it("shows no Editing chip and no set actions when read-only", () => {
    renderSetList(true);
    expect(screen.queryByText("Editing")).toBeNull();
    expect(screen.getByRole("button", { name: "Shown" })).toBeTruthy();
    expect(screen.queryByRole("button", { name: "Duplicate" })).toBeNull();
  });

  it("keeps the Editing chip for editors", () => {
    renderSetList(false);
    expect(screen.getByRole("button", { name: "Editing" })).toBeTruthy();
  });

  it("shows parameter values and the set's name as text, not as inputs", () => {
    const set = { ...PRESETS[0].params, id: "A" } as ParameterSet;
    const { container } = render(<ParameterForm set={set} readOnly onValid={vi.fn()} />);
    expect(container.querySelector("input, select")).toBeNull();
    // the label still names the value it stands beside
    expect(screen.getByLabelText(/E1/).textContent).toBe(String(set.E1));
    expect(screen.getByLabelText(/Xc/).textContent).toBe(set.Xc === null ? "off" : String(set.Xc));
    renderSetList(true);
    expect(screen.queryByRole("textbox", { name: "Name of set A" })).toBeNull();
    expect(screen.getByText(set.label)).toBeTruthy();
  });

  it("shows the path's controls, targets and increments as text", () => {
    const doc: PathDoc = {
      items: [
        {
          kind: "leg",
          leg: { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments: 100 },
        },
      ],
    };
    const { container } = render(<PathTable doc={doc} readOnly onChange={vi.fn()} />);
    expect(container.querySelector("input, select")).toBeNull();
    expect(screen.getByLabelText("leg 1: target of 11 (mm/mm)").textContent).toBe("0.01");
    expect(screen.getByLabelText("leg 1: increments").textContent).toBe("100");
    expect(container.textContent).toContain("strain");
  });

  it("shows the path text as preformatted text, not a text box", () => {
    const text = "strain11 0.01 over 100";
    const doc: PathDoc = { items: [] };
    const { container } = render(
      <PathEditor
        text={text}
        doc={doc}
        legs={[]}
        errors={[]}
        readOnly
        onText={vi.fn()}
        onDoc={vi.fn()}
      />,
    );
    expect(container.querySelector("textarea, input, select")).toBeNull();
    const shown = screen.getByLabelText("Path in text form");
    expect(shown.tagName).toBe("PRE");
    expect(shown.textContent).toBe(text);
  });

  it("keeps the path text box for editors", () => {
    const { container } = render(
      <PathEditor
        text="x"
        doc={{ items: [] }}
        legs={[]}
        errors={[]}
        onText={vi.fn()}
        onDoc={vi.fn()}
      />,
    );
    expect(container.querySelector("textarea")).not.toBeNull();
  });

  it("keeps inputs for editors", () => {
    const set = { ...PRESETS[0].params, id: "A" } as ParameterSet;
    const { container } = render(<ParameterForm set={set} onValid={vi.fn()} />);
    expect((container.querySelector("#param-A-E1") as HTMLInputElement).value).toBe(String(set.E1));
  });
});
