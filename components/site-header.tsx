import Link from "next/link";

import { signOutAction } from "@/app/(auth)/actions";
import { getCurrentSession } from "@/lib/server/accounts/auth/session";

/** Name, the three places, and who is signed in. Server-rendered from the session cookie. */
export async function SiteHeader() {
  const { user } = await getCurrentSession();
  return (
    <header className="border-b border-glaze-line bg-glaze">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:p-2">
        Skip to content
      </a>
      <nav aria-label="Main" className="mx-auto flex max-w-5xl items-center gap-6 px-6 py-3">
        <Link href="/" className="font-display text-lg font-semibold text-kiln">
          Craquelure
        </Link>
        <Link href="/sandbox" className="text-sm text-ink-soft hover:text-ink">
          Sandbox
        </Link>
        <Link href="/teams" className="text-sm text-ink-soft hover:text-ink">
          Teams
        </Link>
        <Link href="/account" className="text-sm text-ink-soft hover:text-ink">
          Account
        </Link>
        <div className="ml-auto flex items-center gap-3 text-sm">
          {user ? (
            <>
              <span className="text-ink-soft" data-testid="signed-in-as">
                {user.email}
              </span>
              <form action={signOutAction}>
                <button
                  type="submit"
                  className="text-verdigris-dark underline-offset-2 hover:underline"
                >
                  Sign out
                </button>
              </form>
            </>
          ) : (
            <>
              <Link href="/sign-in" className="text-verdigris-dark hover:underline">
                Sign in
              </Link>
              <Link
                href="/sign-up"
                className="rounded-md bg-verdigris px-3 py-1.5 text-white hover:bg-verdigris-dark"
              >
                Create account
              </Link>
            </>
          )}
        </div>
      </nav>
    </header>
  );
}
