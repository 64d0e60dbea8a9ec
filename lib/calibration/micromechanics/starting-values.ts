/**
 * Elastic starting values of a parameter set from constituents (issue 6, spec A.4): the aligned
 * Halpin–Tsai ply for oriented material, or its planar-random average for SMC / glass mat.
 * Moduli in MPa. Only a start: fitted values from test records replace them.
 */
import type { MaterialParams } from "@/lib/mechanics/types";
import { alignedPly, type Constituents } from "./halpin-tsai";
import { planarRandom } from "./planar-random";

export type Layout = "aligned" | "planar-random";

export function elasticStart(
  c: Constituents,
  layout: Layout,
): Pick<MaterialParams, "E1" | "E2" | "nu12" | "G12"> {
  const ply = alignedPly(c);
  if (layout === "aligned") return { E1: ply.E11, E2: ply.E22, nu12: ply.nu12, G12: ply.G12 };
  const r = planarRandom(ply);
  return { E1: r.E, E2: r.E, nu12: r.nu, G12: r.G };
}
