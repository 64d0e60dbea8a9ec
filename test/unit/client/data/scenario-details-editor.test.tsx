import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { ScenarioDetailsEditor } from "@/components/scenarios/scenario-details-editor";

const router = { refresh: vi.fn(), push: vi.fn() };
vi.mock("next/navigation", () => ({ useRouter: () => router }));

function editor() {
  const client = new QueryClient();
  return (
    <QueryClientProvider client={client}>
      <ScenarioDetailsEditor
        slug="lab"
        scenarioId="s1"
        name="Beam"
        materialLabel="SMC"
        tags={["crash"]}
        revisions={3}
      />
    </QueryClientProvider>
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  router.refresh.mockClear();
  router.push.mockClear();
});

describe("scenario details", () => {
  it("sends the new name, material and tidied tags, then refreshes the page", async () => {
    const fetchMock = vi.fn(async () => Response.json({ id: "s1" }));
    vi.stubGlobal("fetch", fetchMock);
    render(editor());
    fireEvent.click(screen.getByRole("button", { name: "Edit name, material and tags" }));
    fireEvent.change(screen.getByLabelText("Scenario name"), { target: { value: " Beam B " } });
    fireEvent.change(screen.getByLabelText(/Tags/), { target: { value: "crash, 23 °C, crash," } });
    fireEvent.click(screen.getByRole("button", { name: "Save details" }));
    await waitFor(() => expect(router.refresh).toHaveBeenCalled());
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe("/api/v1/teams/lab/scenarios/s1");
    expect(init.method).toBe("PATCH");
    expect(JSON.parse(String(init.body))).toEqual({
      name: "Beam B",
      materialLabel: "SMC",
      tags: ["crash", "23 °C"],
    });
  });

  it("deletes only after a second, explicit click, then goes back to the table", async () => {
    const fetchMock = vi.fn(async () => Response.json({ deleted: "s1" }));
    vi.stubGlobal("fetch", fetchMock);
    render(editor());
    fireEvent.click(screen.getByRole("button", { name: "Edit name, material and tags" }));
    fireEvent.click(screen.getByRole("button", { name: "Delete scenario…" }));
    expect(fetchMock).not.toHaveBeenCalled();
    expect(screen.getByText(/with its 3 revisions/)).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Delete for good" }));
    await waitFor(() => expect(router.push).toHaveBeenCalledWith("/teams/lab/scenarios"));
    expect((fetchMock.mock.calls[0] as unknown as [string, RequestInit])[1].method).toBe("DELETE");
  });
});
