import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { ReviewPanel } from "@/components/reviews/review-panel";

// Issue 13 item 6: the requester chooses whom a review is asked of, among the team's
// reviewers and owners, and the history says whom each request went to.
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: () => {} }) }));

const emil = { id: "u1", name: "Emil Editor" };
const rita = { id: "u2", name: "Rita Reviewer" };
const olga = { id: "u3", name: "Olga Owner" };

const review = (state: string, history: unknown[] = []) => ({
  revision: {
    id: "r2",
    number: 2,
    author: emil,
    message: "",
    createdAt: "2026-01-01T00:00:00.000Z",
    review: { state, by: state === "draft" ? null : emil, at: null },
  },
  history,
});

const request = {
  id: 1,
  from: "draft",
  to: "in_review",
  actor: emil,
  note: "",
  at: "2026-01-02T00:00:00.000Z",
  importedActor: null,
  askedOf: [olga, rita],
};

type Answer = (body: Record<string, unknown>) => { status: number; json: unknown };

/** A fake API: the review GET answers with what the last accepted POST made of it. */
function serve(answer: Answer) {
  const posted: Record<string, unknown>[] = [];
  let current: unknown = review("draft");
  vi.stubGlobal(
    "fetch",
    vi.fn((url: string, init?: RequestInit) => {
      if (url.endsWith("/comments")) return Promise.resolve(Response.json({ items: [] }));
      if (init?.method === "POST") {
        const body = JSON.parse(String(init.body)) as Record<string, unknown>;
        posted.push(body);
        const { status, json } = answer(body);
        if (status === 200) current = json;
        return Promise.resolve(Response.json(json, { status }));
      }
      return Promise.resolve(Response.json(current));
    }),
  );
  return posted;
}

function panel(choices = [rita, olga, emil]) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <ReviewPanel
        slug="lab"
        scenarioId="s1"
        number={2}
        me={emil}
        canRequest
        canJudge={false}
        canComment={false}
        maxIncrement={10}
        reviewerChoices={choices}
      />
    </QueryClientProvider>,
  );
}

const accepted: Answer = () => ({
  status: 200,
  json: { ...review("in_review", [request]), notified: 2, mailQueued: 0 },
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("the review request form", () => {
  it("lists the reviewers and owners by name as checkboxes, never the requester", async () => {
    serve(accepted);
    panel();
    const group = await screen.findByRole("group", { name: "Ask for a review from" });
    const boxes = within(group).getAllByRole("checkbox");
    expect(boxes.map((b) => b.closest("label")?.textContent)).toEqual([rita.name, olga.name]);
    expect(within(group).queryByText(emil.name)).toBeNull();
  });

  it("asks for a choice beside the field and sends nothing when nobody is chosen", async () => {
    const posted = serve(accepted);
    panel();
    fireEvent.click(await screen.findByRole("button", { name: "Request review" }));
    const group = screen.getByRole("group", { name: "Ask for a review from" });
    expect(within(group).getByRole("alert").textContent).toBe("Choose at least one reviewer.");
    expect(posted).toEqual([]);
  });

  it("sends the chosen reviewers and shows whom the request was asked of", async () => {
    const posted = serve(accepted);
    panel();
    fireEvent.click(await screen.findByRole("checkbox", { name: olga.name }));
    fireEvent.click(screen.getByRole("checkbox", { name: rita.name }));
    fireEvent.click(screen.getByRole("checkbox", { name: olga.name }));
    fireEvent.click(screen.getByRole("checkbox", { name: olga.name }));
    fireEvent.click(screen.getByRole("button", { name: "Request review" }));
    expect(await screen.findByText("Asked of Olga Owner, Rita Reviewer")).toBeTruthy();
    expect(posted).toEqual([{ action: "request", note: "", reviewers: [rita.id, olga.id] }]);
  });

  it("puts the server's refusal of a chosen person beside the checkboxes", async () => {
    serve(() => ({
      status: 400,
      json: {
        error: {
          code: "invalid:reviewers",
          message: "Rita Reviewer is not a reviewer of this team.",
          path: "reviewers",
        },
      },
    }));
    panel();
    fireEvent.click(await screen.findByRole("checkbox", { name: rita.name }));
    fireEvent.click(screen.getByRole("button", { name: "Request review" }));
    const group = screen.getByRole("group", { name: "Ask for a review from" });
    expect((await within(group).findByRole("alert")).textContent).toBe(
      "Rita Reviewer is not a reviewer of this team.",
    );
    // Said once, beside the field, not again under the buttons.
    expect(screen.getAllByText("Rita Reviewer is not a reviewer of this team.")).toHaveLength(1);
  });

  it("says so when the team has nobody else to ask", async () => {
    serve(accepted);
    panel([emil]);
    expect(await screen.findByText(/This team has no reviewer or owner besides you/)).toBeTruthy();
  });
});
