import type { Metadata } from "next";
import { SiteHeader } from "@/components/site-header";
import { Cautions } from "@/components/loading-desk/cautions";
import { SandboxLoadingDesk } from "@/components/loading-desk/sandbox-loading-desk";

export const metadata: Metadata = {
  title: "Sandbox",
  description:
    "Script a load path, edit parameter sets and watch the damage law answer, in your browser.",
};

export default function SandboxPage() {
  return (
    <>
      <SiteHeader />
      <main id="main">
        <div className="mx-auto max-w-[1600px] px-4 pt-4">
          <p className="text-sm text-ink-soft">
            The sandbox runs entirely in your browser; nothing is saved. Send the scenario as a
            link, or sign in to keep it in your team&apos;s store.
          </p>
        </div>
        <SandboxLoadingDesk />
      </main>
      <footer className="mt-8 border-t border-glaze-line bg-glaze-deep/50">
        <div className="mx-auto max-w-[1600px] px-4 py-4">
          <Cautions />
        </div>
      </footer>
    </>
  );
}
