/** Starting paths in the notation; the page lists them and the e2e test picks them by key. */
export interface PathTemplate {
  key: string;
  name: string;
  text: string;
}

export const PATH_TEMPLATES: readonly PathTemplate[] = [
  {
    key: "uniaxial-tension",
    name: "Uniaxial tension",
    text: "# strain 11 to 2 %, the other directions free\nε11=2% over 200\n",
  },
  {
    key: "tension-unload-compression",
    name: "Tension → unload → compression",
    text: "ε11=1% over 100\nσ11=0 over 50     # unload to zero stress\nε11=-0.5% over 100\n",
  },
  {
    key: "growing-cycles",
    name: "Growing-amplitude cycles",
    text:
      "# peaks at 0.2 %, 0.4 %, … 1.4 %, unloading to zero stress each time\n" +
      "repeat 7 grow 1\n  ε11=0.2% over 60\n  σ11=0 over 60\nend\n",
  },
  {
    key: "shear-reversal",
    name: "Shear reversal",
    text: "γ12=1.5% over 100\nγ12=-1.5% over 200\nσ12=0 over 100\n",
  },
  {
    key: "equibiaxial",
    name: "Equibiaxial tension",
    text: "ε11=0.8% ε22=0.8% over 200\n",
  },
  {
    key: "off-axis-tension",
    name: "Off-axis tension (30°)",
    text:
      "# uniaxial stress of 60 MPa at 30° from axis 1: σ = 60·(cos², sin², sin·cos)\n" +
      "σ11=45 σ22=15 σ12=25.98076 over 200\n",
  },
];

export const DEFAULT_TEMPLATE_KEY = "growing-cycles";

export function templateByKey(key: string): PathTemplate | undefined {
  return PATH_TEMPLATES.find((t) => t.key === key);
}
