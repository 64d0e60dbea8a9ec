import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { EditSetValues } from "@/components/parameter-sets/edit-set-values";
import type { ParameterSetView } from "@/lib/client/data/types";
import { PRESETS } from "@/lib/client/loading-desk/presets";

// Issue 13 item 8: a library set's values are edited on its page; saving makes the next version.
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const set = {
  id: "5b0c6f3e-1111-4222-8333-944455556666",
  name: "SMC fit December",
  values: { ...PRESETS[0].params },
  provenance: { kind: "typed" },
  version: 2,
  createdBy: null,
  updatedBy: null,
  createdAt: "2026-12-01T00:00:00.000Z",
  updatedAt: "2026-12-02T00:00:00.000Z",
} as unknown as ParameterSetView;

function mount() {
  const fetchMock = vi.fn((_url: string, init?: RequestInit) =>
    Promise.resolve(Response.json({ ...set, ...JSON.parse(String(init?.body ?? "{}")) })),
  );
  vi.stubGlobal("fetch", fetchMock);
  render(
    <QueryClientProvider client={new QueryClient()}>
      <EditSetValues slug="lab" set={set} />
    </QueryClientProvider>,
  );
  fireEvent.click(screen.getByRole("button", { name: "Edit values" }));
  return fetchMock;
}

describe("EditSetValues", () => {
  it("sends the edited numbers as a PATCH of values and names the next version", async () => {
    const fetchMock = mount();
    fireEvent.change(screen.getByLabelText(/^Y0_1 /), { target: { value: "0.04" } });
    fireEvent.click(screen.getByRole("button", { name: "Save as version 3" }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalled());
    const [url, init] = fetchMock.mock.calls[0];
    expect(url).toContain(`/parameter-sets/${set.id}`);
    expect(init?.method).toBe("PATCH");
    expect(JSON.parse(String(init?.body)).values).toMatchObject({ Y0_1: 0.04, E1: set.values.E1 });
  });

  it("keeps the draft and names the field when a value is not a number, sending nothing", () => {
    const fetchMock = mount();
    fireEvent.change(screen.getByLabelText(/^E1 /), { target: { value: "stiff" } });
    fireEvent.click(screen.getByRole("button", { name: "Save as version 3" }));
    expect(screen.getByRole("alert").textContent).toMatch(/^E1 \(.+\): give a number\.$/);
    expect((screen.getByLabelText(/^E1 /) as HTMLInputElement).value).toBe("stiff");
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
