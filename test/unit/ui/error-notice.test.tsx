import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { ErrorNotice } from "@/components/ui/error-notice";

// Production hides a render error's cause from the browser; the notice asks /api/health.
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function health(status: number) {
  const fetchMock = vi.fn(() => Promise.resolve(new Response("{}", { status })));
  vi.stubGlobal("fetch", fetchMock);
  return fetchMock;
}

describe("ErrorNotice", () => {
  it("says the database is not reachable when the health check answers 503", async () => {
    const fetchMock = health(503);
    render(<ErrorNotice digest="123" onRetry={() => {}} />);
    expect(await screen.findByText("The database is not reachable")).toBeTruthy();
    expect(screen.getByText(/try again shortly/)).toBeTruthy();
    expect(fetchMock).toHaveBeenCalledWith("/api/health", { cache: "no-store" });
  });

  it("keeps the plain message when the database answers", async () => {
    const fetchMock = health(200);
    render(<ErrorNotice onRetry={() => {}} />);
    await vi.waitFor(() => expect(fetchMock).toHaveBeenCalled());
    expect(screen.getByText("Something went wrong on our side")).toBeTruthy();
    expect(screen.queryByText("The database is not reachable")).toBeNull();
  });
});
