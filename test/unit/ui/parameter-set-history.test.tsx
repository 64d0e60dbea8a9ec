import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { ParameterSetHistory } from "@/components/parameter-sets/parameter-set-history";

afterEach(cleanup);

describe("ParameterSetHistory (issue 13 item 8)", () => {
  it("lists versions newest first with date, author and what changed", () => {
    render(
      <ParameterSetHistory
        versions={[
          {
            version: 1,
            createdBy: { id: "u1", name: "Ada Editor" },
            createdAt: "2026-12-01T09:30:00.000Z",
            changed: [],
            provenanceChanged: false,
          },
          {
            version: 2,
            createdBy: null,
            createdAt: "2026-12-04T14:05:00.000Z",
            changed: ["Y0_1", "k6"],
            provenanceChanged: true,
          },
          {
            version: 3,
            createdBy: { id: "u2", name: "Ben Owner" },
            createdAt: "2026-12-04T15:00:00.000Z",
            changed: [],
            provenanceChanged: true,
          },
        ]}
      />,
    );
    const items = screen.getByTestId("set-history").querySelectorAll("li");
    expect([...items].map((li) => li.textContent)).toEqual([
      "Version 3 (current)2026-12-04 15:00 UTCBen Ownernew provenance",
      "Version 22026-12-04 14:05 UTCformer memberchanged Y0_1, k6; new provenance",
      "Version 12026-12-01 09:30 UTCAda Editorfirst version",
    ]);
  });
});
