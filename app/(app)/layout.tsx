import { redirect } from "next/navigation";
import type { ReactNode } from "react";

import { SiteHeader } from "@/app/_parts/site-header";
import { getCurrentSession } from "@/lib/server/accounts/auth/session";

// Everything under (app) needs a session. Pages still check team access themselves:
// a layout does not re-run on every navigation, so it cannot be the only guard.
export default async function AppLayout({ children }: { children: ReactNode }) {
  const { user } = await getCurrentSession();
  if (!user) redirect("/sign-in");
  return (
    <>
      <SiteHeader />
      <main id="main" className="mx-auto w-full max-w-5xl px-6 py-10">
        {children}
      </main>
    </>
  );
}
