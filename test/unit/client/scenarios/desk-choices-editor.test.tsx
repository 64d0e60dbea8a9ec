import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { act, cleanup, fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";

import { ScenarioEditor } from "@/components/scenarios/scenario-editor";
import { defaultScenario } from "@/lib/client/loading-desk/default-scenario";
import { setIncrementCursor } from "@/lib/client/loading-desk/increment-cursor-store";
import { ResultsStore } from "@/lib/client/loading-desk/results-store";
import type { OpenedScenario } from "@/lib/client/loading-desk/scenario-state";

// The solver, Plotly and the save request are outside this test; the team's records come
// through the real hooks from a stubbed fetch.
vi.mock("next/navigation", () => ({ useRouter: () => ({ push: vi.fn(), refresh: vi.fn() }) }));
vi.mock("@/components/loading-desk/use-solver-runs", () => ({ useSolverRuns: () => store }));
vi.mock("@/components/charts/plot", () => ({
  Plot: () => <div data-testid="plot" />,
  saveChartImage: vi.fn(),
  resetChartZoom: vi.fn(),
  fitChartToBox: vi.fn(),
}));
vi.mock("@/lib/client/data/use-library-choices", () => ({ useLibraryChoices: () => [] }));
const mutate = vi.fn();
vi.mock("@/lib/client/data/use-save-revision", () => ({
  useSaveRevision: () => ({ mutate, isPending: false }),
}));

const store = new ResultsStore();
const KEPT = "0b8f5a52-8c1e-4c43-9d4e-1f2a3b4c5d6e";
const GONE = "7d1c2e3f-4a5b-4c6d-8e7f-9a0b1c2d3e4f";
const T1 = { id: KEPT, name: "T1 coupon", testType: "tension-1", loading: "cyclic", pointCount: 3 };

function savedFile(): OpenedScenario {
  return {
    ...defaultScenario(),
    name: "Beam, saved",
    desk: {
      overlays: [
        { recordId: KEPT, name: "T1 coupon" },
        { recordId: GONE, name: "Old coupon" },
      ],
      charts: {
        stressStrain: { stress: "sig12", strain: "gam12" },
        horizontal: { damage: "sig11" },
      },
    },
  };
}

function stubApi() {
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string) => {
      if (url === "/api/v1/teams/lab/test-records") return Response.json({ items: [T1] });
      if (url === `/api/v1/teams/lab/test-records/${KEPT}`)
        return Response.json({ ...T1, points: { strain: [0, 0.001], stress: [0, 9] } });
      return Response.json(
        { error: { code: "not_found:test-record", message: "Test record not found." } },
        { status: 404 },
      );
    }),
  );
}

function mount(editable = true) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <ScenarioEditor
        slug="lab"
        scenarioId="s1"
        number={3}
        file={savedFile()}
        editable={editable}
        teamName="Lab team"
      />
    </QueryClientProvider>,
  );
}

const select = (label: string, root: HTMLElement = document.body) =>
  within(root).getByLabelText(label) as HTMLSelectElement;
const damageCard = () => document.querySelector<HTMLElement>('[data-chart="damage"]')!;

beforeEach(() => {
  localStorage.clear();
  stubApi();
});
afterEach(() => {
  cleanup();
  act(() => setIncrementCursor(null));
  vi.unstubAllGlobals();
  mutate.mockReset();
});

describe("test records and chart choices of a revision (issue 13 item 7)", () => {
  it("come back when the revision opens, and a record the team lacks is named", async () => {
    mount();
    expect(select("Stress component (vertical axis)").value).toBe("sig12");
    expect(select("Strain component (horizontal axis)").value).toBe("gam12");
    expect(select("Horizontal axis", damageCard()).value).toBe("sig11");
    const box = (await screen.findByRole("checkbox", { name: /T1 coupon/ })) as HTMLInputElement;
    expect(box.checked).toBe(true);
    expect(await screen.findByText(/Test record “Old coupon” is not in this team/)).toBeTruthy();
    expect(screen.getByText("2 chosen")).toBeTruthy();
    expect(screen.queryByTestId("unsaved-mark")).toBeNull();
  });

  it("mark the desk unsaved when changed and go into the next revision's desk field", async () => {
    mount();
    fireEvent.change(select("Horizontal axis", damageCard()), { target: { value: "eps22" } });
    fireEvent.change(select("Stress component (vertical axis)"), { target: { value: "sig22" } });
    await waitFor(() => expect(screen.getByTestId("unsaved-mark")).toBeTruthy());
    fireEvent.click(await screen.findByRole("checkbox", { name: /T1 coupon/ }));
    fireEvent.click(screen.getByRole("button", { name: "Save revision" }));
    fireEvent.change(screen.getByLabelText(/message/i), { target: { value: "other axes" } });
    fireEvent.click(screen.getByRole("button", { name: "Save new revision" }));
    await waitFor(() => expect(mutate).toHaveBeenCalled());
    const { file } = mutate.mock.calls[0][0] as { file: { desk: unknown } };
    expect(file.desk).toMatchObject({
      overlays: [{ recordId: GONE, name: "Old coupon" }],
      charts: {
        stressStrain: { stress: "sig22", strain: "gam12" },
        horizontal: { damage: "eps22" },
      },
    });
  });

  it("let an editor take a missing record off the scenario, which is an unsaved change", async () => {
    mount();
    fireEvent.click(await screen.findByRole("button", { name: "Take it off this scenario" }));
    await waitFor(() => expect(screen.queryByText(/Old coupon/)).toBeNull());
    expect(screen.getByTestId("unsaved-mark")).toBeTruthy();
  });

  it("name a missing record to a viewer without offering to change the scenario", async () => {
    mount(false);
    expect(await screen.findByText(/Test record “Old coupon” is not in this team/)).toBeTruthy();
    expect(screen.queryByRole("button", { name: "Take it off this scenario" })).toBeNull();
  });
});
