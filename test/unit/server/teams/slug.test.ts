import { describe, expect, it } from "vitest";

import { slugify, slugWithSuffix } from "@/lib/server/teams/slug";
import { teamSlugSchema } from "@/lib/shared/validations/teams";

describe("team slugs", () => {
  it.each([
    ["Demo composites lab (invented)", "demo-composites-lab-invented"],
    ["  SMC / GMT crash group ", "smc-gmt-crash-group"],
    ["Prüfstand Ülm", "prufstand-ulm"],
    ["***", "team"],
  ])("%s → %s", (name, slug) => {
    expect(slugify(name)).toBe(slug);
    expect(teamSlugSchema.safeParse(slug).success).toBe(true);
  });

  it("stays within the accepted slug shape for long names", () => {
    const slug = slugify("a ".repeat(100));
    expect(slug.length).toBeLessThanOrEqual(48);
    expect(teamSlugSchema.safeParse(slugWithSuffix(slug)).success).toBe(true);
  });

  it("refuses forged slugs before they reach a query", () => {
    for (const forged of ["", "../other", "UPPER", "a b", "-lead", "x".repeat(70)]) {
      expect(teamSlugSchema.safeParse(forged).success).toBe(false);
    }
  });
});
