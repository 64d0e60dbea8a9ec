/**
 * Each parameter set's line style besides its colour, so two nearly equal sets stay apart: a set
 * drawn later lies on top, so every set also gets a narrower line than the one before (the
 * earlier set shows as a border around it) and, on charts of one curve per set, its own dash.
 * On charts of several curves per set (d1 and d2) the dash tells the curves apart and the width
 * the sets. The desk's charts and the report's static charts both read this file.
 */
import { SET_COLORS } from "./set-colors";

/** One dash per set, in the order of SET_COLORS (Plotly's names). */
export const SET_DASHES = ["solid", "dash", "dot", "dashdot", "longdash", "longdashdot"] as const;
export type LineDash = (typeof SET_DASHES)[number];

const WIDEST = 2.8;
const NARROWER_BY = 0.4;
const NARROWEST = 1.2;

/** A set's place among the styles: the place of its colour (colour and style travel together). */
export function setStyleIndex(color: string): number {
  const i = SET_COLORS.indexOf(color as (typeof SET_COLORS)[number]);
  return i < 0 ? 0 : i;
}

export interface SetLineStyle {
  dash: LineDash;
  /** Screen pixels; print scales it. */
  width: number;
}

/**
 * The line of one curve of the set at `setIndex`; `seriesDash` is the chart's dash for this
 * curve, used when the chart draws `seriesPerSet` > 1 curves of each set.
 */
export function setLineStyle(
  setIndex: number,
  seriesDash: LineDash = "solid",
  seriesPerSet = 1,
): SetLineStyle {
  const i = setIndex % SET_DASHES.length;
  return {
    dash: seriesPerSet > 1 ? seriesDash : SET_DASHES[i],
    width: Math.max(NARROWEST, WIDEST - NARROWER_BY * i),
  };
}

/** The same dashes as SVG stroke-dasharray (lengths in line widths, as Plotly scales them). */
const SVG_DASH: Record<LineDash, number[] | null> = {
  solid: null,
  dash: [4, 3],
  dot: [1, 2],
  dashdot: [4, 2, 1, 2],
  longdash: [7, 3],
  longdashdot: [7, 2, 1, 2],
};

export function svgDashArray(dash: LineDash, width: number): string | undefined {
  const pattern = SVG_DASH[dash];
  return pattern ? pattern.map((n) => +(n * width).toFixed(2)).join(" ") : undefined;
}
