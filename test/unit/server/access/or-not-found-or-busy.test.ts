/**
 * A page whose service computes in the pool: the pool's refusals come back as a message to show
 * (not a 404, which would say the page does not exist); other expected refusals stay 404.
 */
import { describe, expect, it } from "vitest";

import { ComputeBusy, overBudget } from "@/lib/server/compute/errors";
import { AppError } from "@/lib/shared/errors";
import { orNotFoundOrBusy } from "@/lib/server/access/or-not-found";

describe("orNotFoundOrBusy", () => {
  it("passes a value through", async () => {
    expect(await orNotFoundOrBusy(Promise.resolve(7))).toEqual({ ok: true, value: 7 });
  });

  it("turns a full pool and an over-budget task into their message", async () => {
    const busy = new ComputeBusy("instance", 5, 2);
    expect(await orNotFoundOrBusy(Promise.reject(busy))).toEqual({
      ok: false,
      message: busy.message,
    });
    const slow = overBudget("report", 20_000);
    expect(await orNotFoundOrBusy(Promise.reject(slow))).toEqual({
      ok: false,
      message: slow.message,
    });
  });

  it("still answers not found for other expected refusals, and rethrows the unexpected", async () => {
    const refused = orNotFoundOrBusy(Promise.reject(new AppError("not-found:team", "no")));
    await expect(refused).rejects.toThrow(/NEXT_HTTP_ERROR_FALLBACK;404|NEXT_NOT_FOUND/);
    await expect(orNotFoundOrBusy(Promise.reject(new Error("boom")))).rejects.toThrow("boom");
  });
});
