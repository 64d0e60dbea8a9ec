export interface ReadOnlyBannerProps {
  /** The team whose editors and owners may change the scenario; unknown on some pages. */
  teamName?: string;
}

/** Says plainly that nothing on this desk can be changed here, and who can change it. */
export function ReadOnlyBanner({ teamName }: ReadOnlyBannerProps) {
  const who = teamName ? `editors and owners of ${teamName}` : "the team's editors and owners";
  return (
    <p
      role="note"
      data-testid="read-only-banner"
      className="rounded-md border border-glaze-line bg-glaze-deep px-3 py-2 text-sm text-ink-soft"
    >
      Read-only: {who} can change this scenario.
    </p>
  );
}
