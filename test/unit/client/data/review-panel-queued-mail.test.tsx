import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { ReviewPanel } from "@/components/reviews/review-panel";
import { MAIL_QUEUED_NOTICE } from "@/lib/shared/mail-types";

// The mail server down during a verdict: the panel says the mails will follow.
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: () => {} }) }));

const rita = { id: "u2", name: "Rita Reviewer" };
const revision = (state: string) => ({
  revision: {
    id: "r2",
    number: 2,
    author: { id: "u1", name: "Emil Editor" },
    message: "",
    createdAt: "2026-01-01T00:00:00.000Z",
    review: { state, by: rita, at: "2026-01-02T00:00:00.000Z" },
  },
  history: [],
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("review panel with the mail server down", () => {
  it("tells the reviewer the e-mail will be sent when the mail server is back", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn((url: string, init?: RequestInit) => {
        if (url.endsWith("/comments")) return Promise.resolve(Response.json({ items: [] }));
        if (init?.method === "POST") {
          return Promise.resolve(
            Response.json({ ...revision("approved"), notified: 0, mailQueued: 2 }),
          );
        }
        return Promise.resolve(Response.json(revision("in_review")));
      }),
    );
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <ReviewPanel
          slug="lab"
          scenarioId="s1"
          number={2}
          me={rita}
          canComment
          maxIncrement={10}
          canRequest={false}
          canJudge
        />
      </QueryClientProvider>,
    );
    fireEvent.click(await screen.findByRole("button", { name: "Approve" }));
    expect(await screen.findByText(MAIL_QUEUED_NOTICE)).toBeTruthy();
    expect(screen.queryByText(/told by e-mail/)).toBeNull();
  });
});
