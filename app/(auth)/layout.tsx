import type { ReactNode } from "react";

import { SiteHeader } from "@/app/_parts/site-header";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <>
      <SiteHeader />
      <main id="main" className="mx-auto w-full max-w-md px-6 py-12">
        {children}
      </main>
    </>
  );
}
