/**
 * Layout of a material-point state in one Float64Array (copied by value between sub-steps, so
 * the hot loop allocates nothing). Angles: TH in radians (internal), TH_DEG in degrees (output).
 */
export const D1 = 0;
export const D2 = 1;
export const DP1 = 2;
export const DP2 = 3;
export const TH = 4;
export const TH_DEG = 5;
/** 1 once an 'onset' frame has locked */
export const FRAME_SET = 6;
/** load-frame stress (11, 22, 12) */
export const SIG = 7;
/** load-frame strain (11, 22, g12) */
export const EPS = 10;
/** damage-frame stress */
export const SIG_D = 13;
export const Y1 = 16;
export const Y2 = 17;
export const W = 18;
export const PHI = 19;
/** closure regime code: bit 0 = family 1 open, bit 1 = family 2 open */
export const REGIME = 20;
/** load-frame frozen strain epsP_L */
export const EPS_P = 21;
export const PSI = 24;
/** broken families (spec C.7, onFailure 'continue'): bit 0 = family 1, bit 1 = family 2 */
export const BROKEN = 25;
export const STATE_SIZE = 26;

/** The undamaged, unloaded state at damage-frame angle thetaDeg (degrees). */
export function initialState(thetaDeg: number): Float64Array {
  const s = new Float64Array(STATE_SIZE);
  s[TH] = (thetaDeg * Math.PI) / 180;
  s[TH_DEG] = thetaDeg;
  s[REGIME] = 3;
  return s;
}

export function copyState(from: Float64Array, to: Float64Array): void {
  for (let i = 0; i < STATE_SIZE; i++) to[i] = from[i];
}
