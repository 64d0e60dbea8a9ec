/**
 * The pool's answers in plain words. A full pool is the caller's cue to wait (429 for one
 * person's cap, 503 for the instance), so both carry Retry-After; a task over its budget is a
 * request that cannot be carried out as sent (422), and the message says what to change.
 * No `server-only`: the unit tests build these messages.
 */
import { AppError } from "@/lib/shared/errors";

export class ComputeBusy extends AppError {
  constructor(
    reason: "person" | "instance",
    readonly retryAfterSeconds: number,
    maxPerPerson: number,
  ) {
    super(
      reason === "person" ? "rate-limited:compute" : "unavailable:compute",
      reason === "person"
        ? `You already have ${maxPerPerson} calculations running; wait for one to finish and try again in ${retryAfterSeconds} s.`
        : `The server is busy with other calculations; try again in ${retryAfterSeconds} s.`,
    );
    this.name = "ComputeBusy";
  }
}

/** What the task was, in the words the message uses. */
export type TaskLabel =
  | "run"
  | "report"
  | "conformance check"
  | "identification"
  | "fit replay"
  | "file reading"
  | "reference bundle";

const ADVICE: Record<TaskLabel, string> = {
  run: "Try fewer increments (or fewer legs), or run the file on your own machine with the command-line driver (npm run drive).",
  report: "Try a path with fewer increments in this revision.",
  "conformance check": "Try a history with fewer rows.",
  identification: "Try fewer or shorter test records.",
  "fit replay": "Try fewer or shorter test records.",
  "file reading": "Try a smaller file.",
  "reference bundle":
    "Try again when the server is less busy, or with fewer parameter sets in this revision.",
};

export function overBudget(label: TaskLabel, budgetMs: number): AppError {
  const seconds = Math.round(budgetMs / 100) / 10;
  return new AppError(
    "invalid:time-budget",
    `The ${label} took longer than ${seconds} s and was stopped. ${ADVICE[label]}`,
  );
}

/** The pool's own refusals (full, or over budget): a page shows their message, never a 404. */
const REFUSAL_CODES = new Set([
  "rate-limited:compute",
  "unavailable:compute",
  "invalid:time-budget",
]);

export function isComputeRefusal(error: unknown): error is AppError {
  return error instanceof AppError && REFUSAL_CODES.has(error.code);
}
