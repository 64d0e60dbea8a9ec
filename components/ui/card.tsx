import type { ReactNode } from "react";

export function Card({ title, children, id }: { title: string; children: ReactNode; id?: string }) {
  const headingId = id ? `${id}-title` : undefined;
  return (
    <section
      aria-labelledby={headingId}
      className="rounded-lg border border-glaze-line bg-white/70 p-5"
    >
      <h2 id={headingId} className="font-display text-lg font-semibold">
        {title}
      </h2>
      <div className="mt-3">{children}</div>
    </section>
  );
}
