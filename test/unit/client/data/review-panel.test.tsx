import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { ReviewPanel } from "@/components/reviews/review-panel";

const refresh = vi.fn();
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh }) }));

const rita = { id: "u2", name: "Rita Reviewer" };

function reviewBody(state: string, by = rita) {
  return {
    revision: {
      id: "r2",
      number: 2,
      author: { id: "u1", name: "Emil Editor" },
      message: "",
      createdAt: "2026-01-01T00:00:00.000Z",
      review: { state, by, at: "2026-01-02T00:00:00.000Z" },
    },
    history: [],
  };
}

function stubApi(state: { now: string }) {
  const fetchMock = vi.fn((url: string, init?: RequestInit) => {
    if (url.endsWith("/comments")) return Promise.resolve(Response.json({ items: [] }));
    if (init?.method === "POST") {
      const { action } = JSON.parse(String(init.body));
      state.now = action === "approve" ? "approved" : "changes_requested";
      return Promise.resolve(Response.json({ ...reviewBody(state.now), notified: 1 }));
    }
    return Promise.resolve(Response.json(reviewBody(state.now)));
  });
  vi.stubGlobal("fetch", fetchMock);
  return fetchMock;
}

function panel(powers: { canRequest: boolean; canJudge: boolean }) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return (
    <QueryClientProvider client={client}>
      <ReviewPanel
        slug="lab"
        scenarioId="s1"
        number={2}
        me={rita}
        canComment
        maxIncrement={10}
        {...powers}
      />
    </QueryClientProvider>
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  refresh.mockClear();
});

describe("review panel", () => {
  it("lets a reviewer approve a revision in review, tells who was mailed, refreshes the page", async () => {
    const fetchMock = stubApi({ now: "in_review" });
    render(panel({ canRequest: false, canJudge: true }));
    fireEvent.change(await screen.findByLabelText(/Note with the verdict/), {
      target: { value: "Fine." },
    });
    fireEvent.click(screen.getByRole("button", { name: "Approve" }));
    await screen.findByText("One person was told by e-mail.");
    const post = fetchMock.mock.calls.find(([, init]) => init?.method === "POST")!;
    expect(post[0]).toBe("/api/v1/teams/lab/scenarios/s1/revisions/2/review");
    expect(JSON.parse(String(post[1]!.body))).toEqual({ action: "approve", note: "Fine." });
    await waitFor(() =>
      expect(screen.getByTestId("review-summary").textContent).toContain("Approved"),
    );
    expect(refresh).toHaveBeenCalled();
    expect(screen.queryByRole("button", { name: "Approve" })).toBeNull();
  });

  it("gives an editor no verdict buttons, only the request on a draft", async () => {
    stubApi({ now: "in_review" });
    render(panel({ canRequest: true, canJudge: false }));
    await screen.findByTestId("review-summary");
    expect(screen.queryByRole("button", { name: "Approve" })).toBeNull();
    expect(screen.queryByRole("button", { name: "Request review" })).toBeNull();
    cleanup();
    stubApi({ now: "draft" });
    render(panel({ canRequest: true, canJudge: false }));
    await screen.findByRole("button", { name: "Request review" });
    expect(screen.queryByRole("button", { name: "Request changes" })).toBeNull();
  });
});
