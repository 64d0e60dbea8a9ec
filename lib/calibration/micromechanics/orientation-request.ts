/**
 * What an orientation-state request may hold (the API route and the page's form share it).
 * Bounds keep the numbers physical; messages name the field as the form labels it.
 */
import { z } from "zod";
import { CLOSURES } from "./closure";

const modulus = (label: string) =>
  z
    .number({ error: `${label} must be a number in MPa` })
    .positive(`${label} must be above 0 MPa`)
    .max(1e6, `${label} must be at most 1,000,000 MPa`);

const alignedPlySchema = z.strictObject({
  E11: modulus("E11"),
  E22: modulus("E22"),
  G12: modulus("G12"),
  nu12: z.number().gt(-1, "nu12 must be above −1").lt(1, "nu12 must be below 1"),
});

const constituentsSchema = z.strictObject({
  Ef: modulus("Fibre modulus Ef"),
  nuf: z.number().gt(-1).lt(0.5, "Fibre Poisson ratio must be below 0.5"),
  Em: modulus("Matrix modulus Em"),
  num: z.number().gt(-1).lt(0.5, "Matrix Poisson ratio must be below 0.5"),
  Vf: z
    .number()
    .gt(0, "Fibre volume fraction must be above 0")
    .lt(1, "Fibre volume fraction must be below 1"),
  aspect: z.number().positive("Aspect ratio l/d must be above 0").max(1e5),
});

const layerSchema = z
  .strictObject({
    fraction: z.number().gt(0, "Each layer's thickness fraction must be above 0").max(1),
    a11: z.number().min(0, "a11 must lie between 0 and 1").max(1, "a11 must lie between 0 and 1"),
    a12: z.number().min(-0.5).max(0.5),
  })
  .refine((l) => l.a12 * l.a12 <= l.a11 * (1 - l.a11) + 1e-12, {
    message: "a12² must not exceed a11·a22: no fibre distribution has that tensor",
    path: ["a12"],
  });

export const orientationRequestSchema = z
  .strictObject({
    ply: z
      .union([alignedPlySchema, z.strictObject({ constituents: constituentsSchema })])
      .describe(
        "The aligned ply's constants (E11, E22, G12, nu12) or { constituents } for Halpin–Tsai",
      ),
    closure: z
      .enum(CLOSURES)
      .default("exact")
      .describe("Fourth-moment closure; exact for flow-induced states by default"),
    layers: z
      .array(layerSchema)
      .min(1, "Give at least one layer")
      .max(50, "At most 50 layers")
      .describe(
        "Layers through the thickness: thickness fraction and the planar tensor (a22 = 1 − a11)",
      ),
    cutAngle: z
      .number()
      .min(-180)
      .max(180)
      .optional()
      .describe("Coupon cut angle φ from the flow (x) direction, degrees"),
  })
  .refine((r) => Math.abs(r.layers.reduce((acc, l) => acc + l.fraction, 0) - 1) <= 1e-6, {
    message: "The layers' thickness fractions must add up to 1",
    path: ["layers"],
  });

export type OrientationRequest = z.output<typeof orientationRequestSchema>;

/** The request in the shape orientationState takes. */
export function toOrientationInput(r: OrientationRequest) {
  return {
    ply: r.ply,
    closure: r.closure,
    layers: r.layers.map((l) => ({ fraction: l.fraction, tensor: { a11: l.a11, a12: l.a12 } })),
    cutAngle: r.cutAngle,
  };
}
