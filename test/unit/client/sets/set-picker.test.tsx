import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { SetPicker } from "@/components/set-picker/set-picker";
import { toLibraryChoice } from "@/lib/client/sets/library-choice";
import { PRESETS } from "@/lib/client/loading-desk/presets";

const fitted = toLibraryChoice({
  id: "5b0c6f3e-1111-4222-8333-944455556666",
  name: "SMC fit December",
  values: { ...PRESETS[0].params, E1: 12345 },
  provenance: {
    kind: "fitted",
    records: ["cyclic 0° (0a1b2c3d-0000-4000-8000-000000000001)"],
  },
  createdBy: { name: "Ada Editor" },
  createdAt: "2026-12-03T10:00:00.000Z",
  version: 2,
});

afterEach(cleanup);

describe("SetPicker", () => {
  it("offers the library beside the presets and adds the chosen library set", () => {
    const onAdd = vi.fn();
    render(<SetPicker library={[fitted]} onAdd={onAdd} />);
    const select = screen.getByLabelText("Parameter set to add");
    expect(screen.getByRole("group", { name: "Presets" })).toBeTruthy();
    expect(screen.getByRole("group", { name: "Team library" })).toBeTruthy();
    fireEvent.change(select, { target: { value: fitted.key } });
    expect(screen.getByTestId("set-pick-provenance").textContent).toBe(
      "SMC fit December (version 2): fitted from cyclic 0° by Ada Editor, 2026-12-03.",
    );
    // issue 13 item 8: the list shows the version next to the name
    expect(screen.getByRole("option", { name: "SMC fit December (version 2)" })).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Add set" }));
    expect(onAdd).toHaveBeenCalledWith(
      expect.objectContaining({ label: "SMC fit December", E1: 12345 }),
    );
  });

  it("adds the first preset when nothing else is chosen", () => {
    const onAdd = vi.fn();
    render(<SetPicker onAdd={onAdd} />);
    expect(screen.queryByRole("group", { name: "Team library" })).toBeNull();
    fireEvent.click(screen.getByRole("button", { name: "Add set" }));
    expect(onAdd).toHaveBeenCalledWith(PRESETS[0].params);
  });
});
