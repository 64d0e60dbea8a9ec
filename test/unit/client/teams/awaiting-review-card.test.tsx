import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { AwaitingReviewCard } from "@/app/(app)/teams/[team]/awaiting-review-card";

afterEach(cleanup);

describe("Awaiting my review card", () => {
  it("names each revision with who asked and when, linking to that revision", () => {
    render(
      <AwaitingReviewCard
        slug="lab"
        items={[
          {
            scenarioId: "s1",
            scenarioName: "Plate, cyclic",
            number: 3,
            requestedBy: { id: "u2", name: "Ed Editor" },
            requestedAt: "2026-03-04T09:15:00.000Z",
            importedRequester: null,
          },
          {
            scenarioId: "s2",
            scenarioName: "Bracket",
            number: 1,
            requestedBy: null,
            requestedAt: null,
            importedRequester: "Eve Example",
          },
        ]}
      />,
    );
    const first = screen.getByRole("link", { name: "Plate, cyclic, revision 3" });
    expect(first.getAttribute("href")).toBe("/teams/lab/scenarios/s1?rev=3");
    expect(screen.getByText("asked by Ed Editor, 2026-03-04 09:15 UTC")).toBeTruthy();
    expect(screen.getByRole("link", { name: "Bracket, revision 1" }).getAttribute("href")).toBe(
      "/teams/lab/scenarios/s2?rev=1",
    );
    expect(screen.getByText("asked by Eve Example (imported)")).toBeTruthy();
  });

  it("says so when nothing waits", () => {
    render(<AwaitingReviewCard slug="lab" items={[]} />);
    expect(screen.getByRole("heading", { name: "Awaiting my review" })).toBeTruthy();
    expect(screen.getByText("Nothing waits for your verdict in this team.")).toBeTruthy();
  });
});
