/**
 * Spec E.2: peaks and valleys of the control signal by a single scan with hysteresis on the
 * 5-point moving median (smoothing for detection only; the fits use raw samples).
 */
import { movingMedian } from "./robust-stats";

export interface TurningPoints {
  peaks: number[];
  valleys: number[]; // valleys[k] follows peaks[k]; the last may be the end of the data
}

/** Raw extreme within the median window around a smoothed extreme (spec: "the raw sample"). */
function refine(raw: ArrayLike<number>, i: number, sign: 1 | -1): number {
  let best = i;
  for (let j = Math.max(0, i - 2); j <= Math.min(raw.length - 1, i + 2); j++) {
    if (sign * raw[j] > sign * raw[best]) best = j;
  }
  return best;
}

export function findTurningPoints(raw: ArrayLike<number>, noise: number): TurningPoints {
  const s = movingMedian(raw, 5);
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < s.length; i++) {
    lo = Math.min(lo, s[i]);
    hi = Math.max(hi, s[i]);
  }
  const h = Math.max(0.02 * (hi - lo), 10 * noise);
  const peaks: number[] = [];
  const valleys: number[] = [];
  let seekingPeak = true;
  let extreme = 0; // index of the running maximum (seeking a peak) or minimum
  for (let i = 1; i < s.length; i++) {
    if (seekingPeak) {
      if (s[i] > s[extreme]) extreme = i;
      else if (s[i] < s[extreme] - h) {
        peaks.push(refine(raw, extreme, 1));
        seekingPeak = false;
        extreme = i;
      }
    } else {
      if (s[i] < s[extreme]) extreme = i;
      else if (s[i] > s[extreme] + h) {
        valleys.push(refine(raw, extreme, -1));
        seekingPeak = true;
        extreme = i;
      }
    }
  }
  // The data may end on an unloading branch: its lowest point closes the last loop.
  if (!seekingPeak) valleys.push(refine(raw, extreme, -1));
  return { peaks, valleys };
}
