// A team import keeps review history and comments as the file told them: names are text, not
// accounts here (a file can name anyone). Every screen that shows them uses these words, so an
// imported sign-off can never be mistaken for one given in this installation.

const VERDICT_WORDS: Record<string, string> = {
  draft: "draft",
  in_review: "in review",
  approved: "approved",
  changes_requested: "changes requested",
};

function named(name: string): string {
  return name ? name : "someone not named";
}

/** "imported: approved by Eve Example (name from the file, not an account)". */
export function importedVerdictText(state: string, name: string): string {
  return `imported: ${VERDICT_WORDS[state] ?? state} by ${named(name)} (name from the file, not an account)`;
}

/** A person of imported history or an imported comment, marked as such. */
export function importedPersonText(name: string): string {
  return `${named(name)} (imported)`;
}
