import { describe, expect, it } from "vitest";

import { roleWithin, tokenCan } from "@/lib/shared/token-roles";
import {
  bearerOf,
  hashApiToken,
  looksLikeApiToken,
  newApiToken,
} from "@/lib/server/accounts/api-tokens/secret";

describe("token roles", () => {
  it("allow a token role only when the owner holds each of its capabilities", () => {
    expect(roleWithin("viewer", "reviewer")).toBe(true);
    expect(roleWithin("editor", "owner")).toBe(true);
    expect(roleWithin("reviewer", "reviewer")).toBe(true);
    // Neither editor nor reviewer covers the other: verdicts versus edits.
    expect(roleWithin("reviewer", "editor")).toBe(false);
    expect(roleWithin("editor", "reviewer")).toBe(false);
    expect(roleWithin("owner", "editor")).toBe(false);
  });

  it("never grant a capability that the token's role or the owner's current role lacks", () => {
    // An editor token whose owner became a reviewer may neither edit nor give verdicts.
    expect(tokenCan("editor", "reviewer", "scenario:edit")).toBe(false);
    expect(tokenCan("editor", "reviewer", "review:verdict")).toBe(false);
    expect(tokenCan("editor", "reviewer", "team:read")).toBe(true);
    expect(tokenCan("viewer", "owner", "export")).toBe(true);
    expect(tokenCan("viewer", "owner", "comment:write")).toBe(false);
    expect(tokenCan("owner", "editor", "fit:run")).toBe(true);
    expect(tokenCan("owner", "editor", "team:delete")).toBe(false);
  });
});

describe("token secrets", () => {
  it("have a recognisable shape and a hash that is not the token", () => {
    const { token, hash, prefix } = newApiToken();
    expect(looksLikeApiToken(token)).toBe(true);
    expect(token.startsWith(prefix)).toBe(true);
    expect(hash).toBe(hashApiToken(token));
    expect(hash).not.toContain(token.slice(4));
    expect(looksLikeApiToken(token + "x")).toBe(false);
    expect(looksLikeApiToken("crq_short")).toBe(false);
  });

  it("reads the Bearer header: absent → null, malformed → empty", () => {
    const req = (h?: string) => new Request("http://x", { headers: h ? { authorization: h } : {} });
    expect(bearerOf(req())).toBeNull();
    expect(bearerOf(req("Bearer crq_abc"))).toBe("crq_abc");
    expect(bearerOf(req("bearer   crq_abc "))).toBe("crq_abc");
    expect(bearerOf(req("Basic dXNlcg=="))).toBe("");
  });
});
