import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { useState } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { RecordOverlayPicker } from "@/components/scenarios/record-overlay-picker";
import { useRecordOverlays } from "@/lib/client/data/use-test-records";
import type { DeskOverlay } from "@/lib/scenario/desk-extras";

const summary = (id: string, name: string, testType: string) => ({
  id,
  name,
  testType,
  loading: "cyclic",
  pointCount: 3,
});
const LIST = {
  items: [
    summary("r1", "T1 coupon", "tension-1"),
    summary("r2", "S1 coupon", "shear-12"),
    summary("r3", "B1 coupon", "biaxial"),
  ],
};
const POINTS = { strain: [0, 0.001, 0.002], stress: [0, 9, 17] };

/** The picker and the overlays hook wired as the scenario page wires them. */
function Harness() {
  const [chosen, setChosen] = useState<DeskOverlay[]>([]);
  const records = useRecordOverlays(
    "lab",
    chosen.map((c) => c.recordId),
  );
  return (
    <>
      <RecordOverlayPicker
        slug="lab"
        selected={chosen}
        onChange={setChosen}
        loading={records.loading}
        errors={records.errors}
      />
      <ul data-testid="overlays">
        {records.overlays.map((o) => (
          <li key={o.id}>{`${o.label} ${o.x} ${o.y} ${o.xs.length}`}</li>
        ))}
      </ul>
    </>
  );
}

function mockApi() {
  const fetchMock = vi.fn(async (url: string) => {
    if (url === "/api/v1/teams/lab/test-records") return Response.json(LIST);
    if (url === "/api/v1/teams/lab/test-records/r1")
      return Response.json({ ...LIST.items[0], points: POINTS });
    return Response.json(
      { error: { code: "internal", message: "The record's points could not be read." } },
      { status: 500 },
    );
  });
  vi.stubGlobal("fetch", fetchMock);
  return fetchMock;
}

function mount() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <Harness />
    </QueryClientProvider>,
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("test records over the loading desk charts", () => {
  it("lists the team's records and refuses the ones with no stress–strain pair", async () => {
    mockApi();
    mount();
    const box = (name: RegExp) => screen.getByRole("checkbox", { name }) as HTMLInputElement;
    await screen.findByRole("checkbox", { name: /T1 coupon/ });
    expect(box(/T1 coupon.*σ11 against ε11/).disabled).toBe(false);
    expect(box(/S1 coupon.*σ12 against γ12/).disabled).toBe(false);
    expect(box(/B1 coupon.*no single stress–strain pair/).disabled).toBe(true);
  });

  it("fetches a ticked record once and turns it into an overlay on its pair; unticking drops it", async () => {
    const fetchMock = mockApi();
    mount();
    const tension = await screen.findByRole("checkbox", { name: /T1 coupon/ });
    fireEvent.click(tension);
    await waitFor(() =>
      expect(screen.getByTestId("overlays").textContent).toBe("T1 coupon eps11 sig11 3"),
    );
    expect(screen.getByText("1 chosen")).toBeTruthy();
    fireEvent.click(tension);
    expect(screen.getByTestId("overlays").textContent).toBe("");
    fireEvent.click(tension);
    await waitFor(() => expect(screen.getByTestId("overlays").textContent).toContain("T1 coupon"));
    const recordCalls = fetchMock.mock.calls.filter(([u]) => u.endsWith("/r1"));
    expect(recordCalls).toHaveLength(1);
  });

  it("says so when a record's points cannot be loaded", async () => {
    mockApi();
    mount();
    fireEvent.click(await screen.findByRole("checkbox", { name: /S1 coupon/ }));
    expect(await screen.findByText("The record's points could not be read.")).toBeTruthy();
    expect(screen.getByTestId("overlays").textContent).toBe("");
  });
});
