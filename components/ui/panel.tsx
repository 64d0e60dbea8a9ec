import type { ReactNode } from "react";

export interface PanelProps {
  id: string;
  title: string;
  /** Right side of the heading (a short status or actions). */
  aside?: ReactNode;
  children: ReactNode;
  className?: string;
}

/** A titled region of a page; the heading names the region for screen readers. */
export function Panel({ id, title, aside, children, className = "" }: PanelProps) {
  return (
    <section
      aria-labelledby={`${id}-title`}
      className={`rounded-lg border border-glaze-line bg-white/60 p-3 ${className}`}
    >
      <div className="mb-2 flex flex-wrap items-baseline gap-2">
        <h2 id={`${id}-title`} className="font-display text-base font-semibold">
          {title}
        </h2>
        {aside ? <div className="ml-auto text-xs text-ink-faint">{aside}</div> : null}
      </div>
      {children}
    </section>
  );
}
