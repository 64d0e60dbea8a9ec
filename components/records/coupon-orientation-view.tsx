import {
  couponFrame,
  type CouponOrientation,
} from "@/lib/calibration/micromechanics/coupon-orientation";

const deg = (x: number) => `${Number(x.toFixed(2))}°`;

/** A record's coupon orientation (spec A.5): cut angle, layers, and the damage frame it gives. */
export function CouponOrientationView({ orientation }: { orientation: CouponOrientation }) {
  const frame = couponFrame(orientation);
  return (
    <section className="mt-6 text-sm" data-testid="record-coupon-orientation">
      <h3 className="font-medium">Coupon orientation</h3>
      <p className="mt-1 text-ink-soft">
        Cut angle φ {deg(orientation.cutAngle)} from the flow direction.{" "}
        {frame.ok
          ? `Flow direction of the thickness-averaged tensor thetaA ${deg(frame.thetaA)}; damage frame thetaD = thetaA − φ = ${deg(frame.thetaD)}.`
          : "The stack is balanced (its averaged tensor is isotropic): the tensors alone give no damage frame."}
      </p>
      <table className="mt-2 text-left">
        <thead>
          <tr className="text-ink-soft">
            <th className="pr-4">Layer</th>
            <th className="pr-4">Thickness fraction</th>
            <th className="pr-4">a11</th>
            <th className="pr-4">a12</th>
          </tr>
        </thead>
        <tbody>
          {orientation.layers.map((l, k) => (
            <tr key={k}>
              <td className="pr-4">{k + 1}</td>
              <td className="pr-4">{l.fraction}</td>
              <td className="pr-4">{l.a11}</td>
              <td className="pr-4">{l.a12}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
