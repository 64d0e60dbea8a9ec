import type { z } from "zod";

import { AppError } from "@/lib/shared/errors";

/**
 * Server-side parse of anything that came over the wire. The first problem becomes an
 * AppError tied to its field, so the form can show it beside that field.
 */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  const field = issue?.path.length ? String(issue.path[0]) : undefined;
  throw new AppError(`invalid:${field ?? "input"}`, issue?.message ?? "Invalid input.", field);
}
