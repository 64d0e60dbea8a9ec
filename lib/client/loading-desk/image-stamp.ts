/**
 * What a saved chart image says about itself: an image travels alone (a slide, a report, an
 * e-mail), so it carries its chart, scenario, revision, the sets drawn, the date and the caution,
 * drawn into the picture rather than kept beside it.
 */
// Plotly titles take a little markup; names typed by people must not add any.
import { escapeMarkup } from "@/lib/shared/escape-markup";

export interface ImageStampInput {
  chartTitle: string;
  scenarioName: string;
  /** "revision 4", or null for unsaved or sandbox work */
  revision: string | null;
  sets: { id: string; label: string }[];
  date?: Date;
}

export interface ImageStamp {
  title: string;
  footer: string;
}

export function imageStamp(input: ImageStampInput): ImageStamp {
  const date = (input.date ?? new Date()).toISOString().slice(0, 16).replace("T", " ");
  const where = input.revision ?? "not saved";
  const sets = input.sets.map((s) => (s.label ? `${s.id} ${s.label}` : s.id)).join(", ");
  return {
    title: `${input.chartTitle} · ${input.scenarioName} (${where})`,
    footer: `Sets: ${sets || "none"} · ${date} UTC · Craquelure · no design allowable`,
  };
}

/** Extra room (px) the two stamp lines need above the plot in the saved image. */
export const STAMP_TOP = 52;

/**
 * The layout of the saved image: the drawn layout with the stamp as a two-line title (the second
 * line smaller) and room made for it above the plot, so it never covers the legend or the data.
 */
export function stampedLayout(
  layout: Record<string, unknown>,
  stamp: ImageStamp,
): Record<string, unknown> {
  const margin = (layout.margin ?? {}) as Record<string, number>;
  return {
    ...layout,
    title: {
      text: `${escapeMarkup(stamp.title)}<br><span style="font-size:10px">${escapeMarkup(stamp.footer)}</span>`,
      x: 0.01,
      xanchor: "left",
      y: 0.98,
      yanchor: "top",
      font: { size: 13 },
    },
    margin: { ...margin, t: (margin.t ?? 0) + STAMP_TOP },
    paper_bgcolor: "#ffffff",
  };
}
