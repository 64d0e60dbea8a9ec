const VERDICTS: Record<string, string> = {
  draft: "Not yet sent for review",
  in_review: "Awaiting the reviewer's verdict",
  approved: "Approved",
  changes_requested: "Changes requested",
};

/** The review state in the words the report prints. */
export function verdictWords(state: string): string {
  return VERDICTS[state] ?? state;
}
