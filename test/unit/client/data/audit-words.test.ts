import { describe, expect, it } from "vitest";

import { describeAuditEvent } from "@/lib/client/data/audit-words";

describe("audit trail in words", () => {
  it("names the revision and its base for a save", () => {
    expect(describeAuditEvent("revision.save", { number: 3, base: 2 })).toBe(
      "saved a revision (rev 3, on rev 2)",
    );
  });

  it("quotes names and shows review moves", () => {
    expect(describeAuditEvent("scenario.create", { name: "Bumper" })).toBe(
      "created scenario “Bumper”",
    );
    expect(
      describeAuditEvent("review.approve", { revision: 2, from: "in_review", to: "approved" }),
    ).toBe("approved (rev 2, in_review → approved)");
  });

  it("falls back to the action in words for unknown actions and odd details", () => {
    expect(describeAuditEvent("thing.did-stuff", null)).toBe("thing did stuff");
    expect(describeAuditEvent("share-link.create", { days: "x", revision: 1 })).toBe(
      "created a share link (rev 1)",
    );
  });
});
