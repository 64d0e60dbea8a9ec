/** Beside the save button: the desk holds changes that no revision has yet. */
export function UnsavedMark() {
  return (
    <span
      data-testid="unsaved-mark"
      title="The desk differs from the saved revision"
      className="rounded-full border border-ochre-dark/50 bg-amber-50 px-2 py-0.5 text-xs text-amber-900"
    >
      Unsaved changes
    </span>
  );
}
