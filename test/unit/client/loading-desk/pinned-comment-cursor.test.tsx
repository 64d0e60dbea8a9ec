import { act, cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { ChartGrid } from "@/components/loading-desk/chart-grid";
import { CommentItem } from "@/components/reviews/comment-item";
import type { CommentNode } from "@/lib/client/data/types";
import {
  getIncrementCursor,
  setIncrementCursor,
} from "@/lib/client/loading-desk/increment-cursor-store";
import { ResultsStore } from "@/lib/client/loading-desk/results-store";

// Plotly is outside this test: each chart shows the increment it is told to mark, which is the
// cursor it passes to buildChart (chart-traces.test.ts checks that the mark is drawn there).
vi.mock("@/components/charts/result-chart", () => ({
  ResultChart: ({ def, cursor }: { def: { key: string }; cursor: number | null }) => (
    <p data-testid="chart">
      {def.key}: {cursor === null ? "no cursor" : `marks ${cursor}`}
    </p>
  ),
}));

function comment(increment: number | null): CommentNode {
  return {
    id: `c-${increment}`,
    parentId: null,
    author: { id: "u1", name: "Rita Reviewer" },
    body: "Damage starts early here",
    increment,
    createdAt: "2026-01-01T00:00:00.000Z",
    editedAt: null,
    importedAuthor: null,
    replies: [],
  };
}

function desk(pinned: number | null) {
  return render(
    <>
      <ChartGrid
        store={new ResultsStore()}
        entries={[]}
        scenarioName="Plate"
        totalIncrements={400}
      />
      <ul>
        <CommentItem
          comment={comment(pinned)}
          canReply={false}
          maxIncrement={400}
          onReply={() => {}}
        />
      </ul>
    </>,
  );
}

afterEach(() => {
  cleanup();
  act(() => setIncrementCursor(null));
});

describe("a comment pinned to an increment", () => {
  it("is a button that moves the desk's increment cursor there and marks it on every chart", () => {
    desk(250);
    const charts = screen.getAllByTestId("chart");
    expect(charts.length).toBeGreaterThan(1);
    for (const c of charts) expect(c.textContent).toMatch(/no cursor$/);
    expect(screen.getByRole("status").textContent).toBe("off");

    const pin = screen.getByRole("button", { name: "at increment 250" });
    expect(pin.getAttribute("aria-pressed")).toBe("false");
    fireEvent.click(pin);

    for (const c of screen.getAllByTestId("chart")) expect(c.textContent).toMatch(/marks 250$/);
    expect(screen.getByRole("status").textContent).toBe("increment 250 / 400");
    expect((screen.getByLabelText("Increment cursor") as HTMLInputElement).value).toBe("250");
    expect(pin.getAttribute("aria-pressed")).toBe("true");

    // Moving the cursor on the desk releases the comment's pressed look.
    fireEvent.change(screen.getByLabelText("Increment cursor"), { target: { value: "12" } });
    expect(pin.getAttribute("aria-pressed")).toBe("false");
    for (const c of screen.getAllByTestId("chart")) expect(c.textContent).toMatch(/marks 12$/);
  });

  it("leaves a comment without an increment as plain text, and the desk clears the cursor when it goes", () => {
    const { unmount } = desk(null);
    expect(screen.queryByRole("button", { name: /at increment/ })).toBeNull();
    act(() => setIncrementCursor(30));
    expect(screen.getByRole("status").textContent).toBe("increment 30 / 400");
    unmount();
    expect(getIncrementCursor()).toBeNull();
  });
});
