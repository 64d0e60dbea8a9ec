import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, fireEvent, render, screen, waitFor } from "@testing-library/react";
import type { ReactNode } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { CommentsSection } from "@/components/reviews/comments-section";

const me = { id: "u1", name: "Rita Reviewer" };
const saved = (body: string) => ({
  id: "c1",
  parentId: null,
  author: me,
  body,
  increment: null,
  createdAt: "2026-01-01T00:00:00.000Z",
  editedAt: null,
  replies: [],
});

function wrap(children: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

function section(canComment = true) {
  return wrap(
    <CommentsSection
      slug="lab"
      scenarioId="s1"
      number={2}
      me={me}
      canComment={canComment}
      maxIncrement={100}
    />,
  );
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe("comments on a revision", () => {
  it("shows a new comment at once as sending, then as saved; markup stays text", async () => {
    let answer: (value: Response) => void = () => {};
    let stored: ReturnType<typeof saved>[] = [];
    const fetchMock = vi.fn((url: string, init?: RequestInit) => {
      if (init?.method === "POST") return new Promise<Response>((resolve) => (answer = resolve));
      return Promise.resolve(Response.json({ items: stored }));
    });
    vi.stubGlobal("fetch", fetchMock);
    render(section());
    await screen.findByText("No comments on this revision yet.");
    const body = "Check <b>loop 3</b>";
    fireEvent.change(screen.getByLabelText("Add a comment"), { target: { value: body } });
    fireEvent.click(screen.getByRole("button", { name: "Comment" }));
    await screen.findByText(/sending…/);
    expect(screen.getByText(body).innerHTML).toBe("Check &lt;b&gt;loop 3&lt;/b&gt;");
    const posted = fetchMock.mock.calls.find(([, init]) => init?.method === "POST")!;
    expect(posted[0]).toBe("/api/v1/teams/lab/scenarios/s1/revisions/2/comments");
    expect(JSON.parse(String(posted[1]!.body))).toEqual({ body });
    stored = [saved(body)];
    answer(Response.json({ id: "c1", items: stored }, { status: 201 }));
    await waitFor(() => expect(screen.queryByText(/sending…/)).toBeNull());
    expect(screen.getByText("Comments (1)")).toBeTruthy();
  });

  it("takes the comment back and says so when the server refuses it", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn((_url: string, init?: RequestInit) =>
        Promise.resolve(
          init?.method === "POST"
            ? Response.json(
                { error: { code: "forbidden:team", message: "You may not comment here." } },
                { status: 403 },
              )
            : Response.json({ items: [] }),
        ),
      ),
    );
    render(section());
    await screen.findByText("No comments on this revision yet.");
    fireEvent.change(screen.getByLabelText("Add a comment"), { target: { value: "hello" } });
    fireEvent.click(screen.getByRole("button", { name: "Comment" }));
    await screen.findByText(/Your comment was not saved: You may not comment here\./);
    expect(screen.queryByText("hello")).toBeNull();
  });

  it("offers no form to someone who may only read, and refuses a pin outside the path", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(() => Promise.resolve(Response.json({ items: [] }))),
    );
    render(section(false));
    await screen.findByText("No comments on this revision yet.");
    expect(screen.queryByLabelText("Add a comment")).toBeNull();
    cleanup();
    render(section(true));
    fireEvent.change(await screen.findByLabelText("Add a comment"), { target: { value: "x" } });
    fireEvent.change(screen.getByLabelText(/Pin to increment/), { target: { value: "101" } });
    expect(screen.getByText("The path has increments 0 to 100.")).toBeTruthy();
    expect((screen.getByRole("button", { name: "Comment" }) as HTMLButtonElement).disabled).toBe(
      true,
    );
  });
});
