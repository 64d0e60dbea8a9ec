/**
 * Small zod building blocks whose messages read well after a JSON path
 * ("parameterSets[0].E1: required (a number)"). Messages are ours, not zod's defaults.
 */
import { z } from "zod";

/** Describes what arrived instead of a usable number. */
function describeBadNumber(input: unknown): string {
  if (input === undefined) return "required (a number)";
  if (typeof input === "number") return "must be a finite number";
  if (input === null) return "must be a number, got null";
  if (typeof input === "string") return `must be a number, got the string ${JSON.stringify(input)}`;
  return `must be a number, got ${Array.isArray(input) ? "an array" : typeof input}`;
}

/** A finite number (zod 4 already rejects NaN and ±Infinity; the message says so plainly). */
export function finiteNumber() {
  return z.number({ error: (issue) => describeBadNumber(issue.input) });
}

/** A finite number that must satisfy `test`; `range` is the rule as the message states it. */
export function numberIn(test: (x: number) => boolean, range: string) {
  return finiteNumber().refine(test, { error: `must be ${range}` });
}

/** One of a few words. */
export function choice<const T extends readonly [string, ...string[]]>(values: T) {
  const list = values.map((v) => JSON.stringify(v)).join(", ");
  return z.enum(values, {
    error: (issue) =>
      issue.input === undefined ? `required (one of ${list})` : `must be one of ${list}`,
  });
}

/** An integer within [min, max]. */
export function integerIn(min: number, max: number) {
  return finiteNumber().refine((x) => Number.isInteger(x) && x >= min && x <= max, {
    error:
      max === Infinity ? `must be an integer >= ${min}` : `must be an integer in [${min}, ${max}]`,
  });
}

/** Object-level message: "required (…)" when absent, "must be …" when of the wrong type. */
export function objectError(what: string) {
  return {
    error: (issue: { code: string; input?: unknown }) => {
      if (issue.code !== "invalid_type") return undefined;
      return issue.input === undefined ? `required (${what})` : `must be ${what}`;
    },
  };
}
