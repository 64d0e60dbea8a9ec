import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { ParameterForm } from "@/components/workbench/parameter-form";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { PRESETS } from "@/lib/client/workbench/presets";

const set = { ...PRESETS[0].params, id: "A" } as ParameterSet;

afterEach(cleanup);

describe("parameter form", () => {
  it("names the field and the rule for a value that is not a number, and passes on only valid sets", async () => {
    const onValid = vi.fn();
    render(<ParameterForm set={set} onValid={onValid} />);
    const e1 = screen.getByLabelText(/^E1/);
    fireEvent.change(e1, { target: { value: "abc" } });
    await waitFor(() => expect(screen.getByText("E1 must be a finite number")).toBeTruthy());
    expect(e1.getAttribute("aria-invalid")).toBe("true");
    expect(onValid).not.toHaveBeenCalledWith(expect.objectContaining({ E1: Number.NaN }));
    onValid.mockClear();
    fireEvent.change(e1, { target: { value: "12000" } });
    await waitFor(() =>
      expect(onValid).toHaveBeenCalledWith(
        expect.objectContaining({ E1: 12000, label: set.label }),
      ),
    );
  });

  it("reports a rule between fields on the field to change", async () => {
    const onValid = vi.fn();
    render(<ParameterForm set={set} onValid={onValid} />);
    fireEvent.change(screen.getByLabelText(/^a1/), { target: { value: "5" } });
    await waitFor(() =>
      expect(screen.getByText(/a1 must be > 0 and a1·sqrt\(Y0_1\) < 1/)).toBeTruthy(),
    );
    expect(onValid).not.toHaveBeenCalledWith(expect.objectContaining({ a1: 5 }));
  });

  it("shows the unit and range of the law in use", async () => {
    render(<ParameterForm set={{ ...set, law: "linY", a1: 2, a2: 2 }} onValid={() => {}} />);
    expect(screen.getAllByText("MPa^-1").length).toBe(2);
    expect(screen.getByText("> 0 and 2·a1·Y0_1 < 1")).toBeTruthy();
  });
});
