import Link from "next/link";

import { LoopSketch } from "@/components/home/loop-sketch";

const STEPS = [
  {
    title: "Calibrate",
    text: "Upload cyclic coupon curves; loops, unloading moduli and permanent strains become threshold, growth slope and frozen-strain parameters.",
  },
  {
    title: "Check",
    text: "Script load paths the tests never covered — tension, unload, compression, shear reversal, biaxial — and watch stress, damage and energy grow live.",
  },
  {
    title: "Hand off",
    text: "Compare parameter sets, get a reviewer's verdict, and give the simulation team reference curves their finite-element run must reproduce.",
  },
];

export default function HomePage() {
  return (
    <main className="mx-auto max-w-5xl px-6 py-14">
      <div className="grid items-center gap-10 md:grid-cols-[1.2fr_1fr]">
        <div>
          <p className="text-sm font-semibold uppercase tracking-widest text-verdigris-dark">
            Damage laws for short-fibre composites
          </p>
          <h1 className="mt-2 font-display text-5xl font-semibold">Craquelure</h1>
          <p className="mt-4 text-lg text-ink-soft">
            Calibrate an anisotropic damage law — crack closure, permanent strain — on your own
            coupon tests, check it on the paths your part will see, and hand reference curves to the
            team that runs the finite-element model.
          </p>
          <div className="mt-8 flex flex-wrap gap-3">
            <Link
              href="/sandbox"
              className="rounded-md bg-kiln px-5 py-2.5 font-medium text-white hover:bg-kiln-dark"
            >
              Open the sandbox
            </Link>
            <Link
              href="/sign-in"
              className="rounded-md border border-ink/30 px-5 py-2.5 font-medium hover:border-ink"
            >
              Sign in
            </Link>
            <Link
              href="/sign-up"
              className="rounded-md px-3 py-2.5 font-medium text-verdigris-dark underline-offset-4 hover:underline"
            >
              Create an account
            </Link>
          </div>
          <p className="mt-3 text-sm text-ink-faint">
            The sandbox needs no account and keeps nothing; sign in to save scenarios for your team.
          </p>
        </div>
        <div className="rounded-xl border border-glaze-line bg-white/60 p-4 shadow-sm">
          <LoopSketch />
        </div>
      </div>

      <ol className="mt-16 grid gap-6 md:grid-cols-3">
        {STEPS.map((step, index) => (
          <li key={step.title} className="rounded-lg border border-glaze-line bg-white/50 p-5">
            <span className="font-display text-sm font-semibold text-kiln">0{index + 1}</span>
            <h2 className="mt-1 font-display text-xl font-semibold">{step.title}</h2>
            <p className="mt-2 text-sm leading-relaxed text-ink-soft">{step.text}</p>
          </li>
        ))}
      </ol>

      <p className="mt-14 rounded-md border-l-4 border-kiln/40 bg-kiln-light/40 p-4 text-sm text-ink-soft">
        Results come from a phenomenological damage model fitted to coupon tests. They are no design
        allowable: structural decisions rest with qualified engineers under the applicable codes,
        standards and qualification procedures.
      </p>
    </main>
  );
}
