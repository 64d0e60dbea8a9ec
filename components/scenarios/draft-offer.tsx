import { draftTimeText } from "@/lib/client/loading-desk/kept-draft";

export interface DraftOfferProps {
  savedAt: Date;
  onRestore: () => void;
  onDiscard: () => void;
}

/** Offers back the edits this browser kept when the engineer last left the scenario unsaved. */
export function DraftOffer({ savedAt, onRestore, onDiscard }: DraftOfferProps) {
  return (
    <div
      role="region"
      aria-label="Kept draft"
      className="flex flex-wrap items-center gap-3 rounded-md border border-ochre-dark/40 bg-amber-50 px-3 py-2 text-sm text-amber-900"
    >
      <p>
        A draft from <time dateTime={savedAt.toISOString()}>{draftTimeText(savedAt)}</time> is kept
        in this browser:
      </p>
      <button
        type="button"
        onClick={onRestore}
        className="rounded-md bg-kiln px-3 py-1 text-white hover:bg-kiln-dark"
      >
        Restore
      </button>
      <button
        type="button"
        onClick={onDiscard}
        className="rounded-md border border-glaze-line bg-white px-3 py-1 hover:bg-glaze-deep"
      >
        Discard
      </button>
    </div>
  );
}
