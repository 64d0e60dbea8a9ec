import { describe, expect, it } from "vitest";

import { classifyDbError, DB_RETRY_AFTER_SECONDS } from "@/lib/server/http/db-errors";

const err = (props: Record<string, unknown>) => Object.assign(new Error("x"), props);

describe("classifyDbError", () => {
  it("calls a refused or dropped connection an outage, also when wrapped", () => {
    const unavailable = { kind: "unavailable", retryAfterSeconds: DB_RETRY_AFTER_SECONDS };
    expect(classifyDbError(err({ code: "ECONNREFUSED" }))).toEqual(unavailable);
    expect(classifyDbError(err({ code: "CONNECTION_CLOSED" }))).toEqual(unavailable);
    expect(classifyDbError(err({ cause: err({ code: "57P01" }) }))).toEqual(unavailable);
    expect(classifyDbError(err({ code: "08006" }))).toEqual(unavailable);
    const aggregate = Object.assign(new AggregateError([err({ code: "ECONNREFUSED" })]), {});
    expect(classifyDbError(err({ cause: aggregate }))).toEqual(unavailable);
  });

  it("calls a NUL byte the client's fault and leaves everything else to the bug path", () => {
    expect(classifyDbError(err({ cause: err({ code: "22021" }) }))).toEqual({ kind: "bad-text" });
    expect(classifyDbError(err({ code: "23505" }))).toBeNull();
    expect(classifyDbError(new TypeError("undefined is not a function"))).toBeNull();
    expect(classifyDbError(null)).toBeNull();
  });
});
