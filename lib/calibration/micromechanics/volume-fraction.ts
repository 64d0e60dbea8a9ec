/** Fibre weight fraction → volume fraction (spec A.4). Densities in any one unit (g/cm³). */
export function volumeFraction(wf: number, rhoF: number, rhoM: number): number {
  const fibre = wf / rhoF;
  return fibre / (fibre + (1 - wf) / rhoM);
}
