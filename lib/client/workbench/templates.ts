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
    text: "# strain 11 to 2 %, the other directions free\ne11=2% in 200\n",
  },
  {
    key: "tension-unload-compression",
    name: "Tension → unload → compression",
    text: "e11=1% in 100\ns11=0 in 50     # unload to zero stress\ne11=-0.5% in 100\n",
  },
  {
    key: "growing-cycles",
    name: "Growing-amplitude cycles",
    text:
      "# peaks at 0.2 %, 0.4 %, … 1.4 %, unloading to zero stress each time\n" +
      "repeat 7 grow 1\n  e11=0.2% in 60\n  s11=0 in 60\nend\n",
  },
  {
    key: "shear-reversal",
    name: "Shear reversal",
    text: "g12=1.5% in 100\ng12=-1.5% in 200\ns12=0 in 100\n",
  },
  {
    key: "equibiaxial",
    name: "Equibiaxial tension",
    text: "e11=0.8% e22=0.8% in 200\n",
  },
  {
    key: "off-axis-tension",
    name: "Off-axis tension (30°)",
    text:
      "# uniaxial stress of 60 MPa at 30° from axis 1: s = 60·(cos², sin², sin·cos)\n" +
      "s11=45 s22=15 s12=25.98076 in 200\n",
  },
];

export const DEFAULT_TEMPLATE_KEY = "growing-cycles";

export function templateByKey(key: string): PathTemplate | undefined {
  return PATH_TEMPLATES.find((t) => t.key === key);
}
