import { readDeskExtras } from "@/lib/scenario/desk-extras";
import type { Metadata } from "next";
import { headers } from "next/headers";
import { notFound } from "next/navigation";

import { SiteHeader } from "@/app/_parts/site-header";
import { SharedRevisionHeader } from "@/components/share/shared-revision-header";
import { SharedLoadingDeskLoader } from "@/components/share/shared-loading-desk-loader";
import { Cautions } from "@/components/loading-desk/cautions";
import { getDb } from "@/db/index";
import { clientAddressOf } from "@/lib/server/http/request-actor";
import { orNotFound } from "@/lib/server/access/or-not-found";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { openSharedRevision } from "@/lib/server/workspace/share-view";

// The token is the secret: never indexed, never sent on as a Referer.
export const metadata: Metadata = {
  title: "Shared revision",
  robots: { index: false, follow: false },
  referrer: "no-referrer",
};

async function open(token: string) {
  const request = new Request("http://share.local/", { headers: await headers() });
  // Expired, revoked, unknown and rate-limited all look the same from outside.
  return orNotFound(openSharedRevision(getDb(), token, clientAddressOf(request)));
}

/** Anyone holding the link: one revision, read-only, computed in their own browser. */
export default async function SharedRevisionPage({
  params,
}: {
  params: Promise<{ token: string }>;
}) {
  const { token } = await params;
  const shared = await open(token);
  const parsed = parseScenarioFile(shared.file);
  if (!parsed.ok) notFound();
  const scenario = { ...parsed.scenario, desk: readDeskExtras(shared.file) };
  return (
    <>
      <SiteHeader />
      <main id="main">
        <div className="mx-auto max-w-[1600px] space-y-3 px-4 pt-4">
          <SharedRevisionHeader shared={shared} />
          <div className="rounded-md border border-kiln/30 bg-kiln-light/50 px-3 py-2">
            <Cautions />
          </div>
        </div>
        <SharedLoadingDeskLoader scenario={scenario} teamName={shared.teamName} />
      </main>
      <footer className="mt-8 border-t border-glaze-line bg-glaze-deep/50">
        <div className="mx-auto max-w-[1600px] px-4 py-4">
          <Cautions compact />
        </div>
      </footer>
    </>
  );
}
