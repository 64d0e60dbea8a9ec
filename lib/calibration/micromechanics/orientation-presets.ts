/**
 * Starting layouts for the orientation section: one layer, or the skin/core/skin stack of a
 * moulded plaque (spec A.5's balanced example: skins a11 = 0.8 at 0.25 each, core a11 = 0.2).
 */
export interface LayerDraft {
  name: string;
  fraction: string;
  a11: string;
  a12: string;
}

export const SINGLE_LAYER: LayerDraft[] = [
  { name: "Layer 1", fraction: "1", a11: "0.8", a12: "0" },
];

export const SKIN_CORE_SKIN: LayerDraft[] = [
  { name: "Skin", fraction: "0.25", a11: "0.8", a12: "0" },
  { name: "Core", fraction: "0.5", a11: "0.2", a12: "0" },
  { name: "Skin", fraction: "0.25", a11: "0.8", a12: "0" },
];

/** The drafts as numbers, or the first problem in the form's words. */
export function readLayers(
  drafts: LayerDraft[],
):
  | { ok: true; layers: { fraction: number; a11: number; a12: number }[] }
  | { ok: false; message: string } {
  const layers = [];
  for (const [k, d] of drafts.entries()) {
    const fraction = Number(d.fraction);
    const a11 = Number(d.a11);
    const a12 = Number(d.a12);
    const where = `${d.name || `Layer ${k + 1}`} (row ${k + 1})`;
    if (!(fraction > 0 && fraction <= 1))
      return { ok: false, message: `${where}: thickness fraction must lie in (0, 1].` };
    if (!(a11 >= 0 && a11 <= 1))
      return { ok: false, message: `${where}: a11 must lie between 0 and 1.` };
    if (!Number.isFinite(a12) || a12 * a12 > a11 * (1 - a11) + 1e-12)
      return {
        ok: false,
        message: `${where}: a12² must not exceed a11·a22 = ${(a11 * (1 - a11)).toFixed(4)}.`,
      };
    layers.push({ fraction, a11, a12 });
  }
  const total = layers.reduce((acc, l) => acc + l.fraction, 0);
  if (Math.abs(total - 1) > 1e-6)
    return {
      ok: false,
      message: `Thickness fractions add up to ${total.toFixed(4)}; they must add up to 1.`,
    };
  return { ok: true, layers };
}
