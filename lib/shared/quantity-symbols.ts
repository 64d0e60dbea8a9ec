// How people read the result columns: the contract's ASCII names (sig11, gam12, ...) stay in
// files and URLs; every label, table and report shows these symbols instead.

export type StrainComponent = "eps11" | "eps22" | "gam12";
export type StressComponent = "sig11" | "sig22" | "sig12";

export const STRAIN_LABEL: Record<StrainComponent, string> = {
  eps11: "ε11",
  eps22: "ε22",
  gam12: "γ12",
};

export const STRESS_LABEL: Record<StressComponent, string> = {
  sig11: "σ11",
  sig22: "σ22",
  sig12: "σ12",
};

const OTHER_LABEL: Record<string, string> = { d1: "d1", d2: "d2" };

/** The symbol of a result column for people; an unknown name is shown as it is. */
export function quantitySymbol(name: string): string {
  return (
    STRESS_LABEL[name as StressComponent] ??
    STRAIN_LABEL[name as StrainComponent] ??
    OTHER_LABEL[name] ??
    name
  );
}
