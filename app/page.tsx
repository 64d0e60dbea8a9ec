import Link from "next/link";

export default function HomePage() {
  return (
    <main className="mx-auto max-w-3xl px-6 py-16">
      <h1 className="font-display text-4xl font-semibold">Craquelure</h1>
      <p className="mt-4 text-lg text-ink-soft">
        Calibrate a continuum damage law on your coupon tests, check it on loading paths the tests
        did not cover, and hand reference curves to the simulation team.
      </p>
      <Link
        href="/sandbox"
        className="mt-8 inline-block rounded-md bg-kiln px-4 py-2 text-white hover:bg-kiln-dark"
      >
        Open the sandbox
      </Link>
    </main>
  );
}
