import Link from "next/link";

import { signOutAction } from "@/app/(auth)/actions";
import { getCurrentSession } from "@/lib/server/accounts/auth/session";

const PLACES = [
  { href: "/sandbox", label: "Sandbox" },
  { href: "/teams", label: "Teams" },
  { href: "/account", label: "Account" },
] as const;

function Places({ className }: { className: string }) {
  return (
    <>
      {PLACES.map((p) => (
        <Link key={p.href} href={p.href} className={className}>
          {p.label}
        </Link>
      ))}
    </>
  );
}

function Who({ email, testId }: { email: string | null; testId: string }) {
  if (!email) {
    return (
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
    );
  }
  return (
    <>
      <span className="max-w-[16rem] truncate text-ink-soft" data-testid={testId}>
        {email}
      </span>
      <form action={signOutAction}>
        <button type="submit" className="text-verdigris-dark underline-offset-2 hover:underline">
          Sign out
        </button>
      </form>
    </>
  );
}

/**
 * Name, the three places, and who is signed in. Server-rendered from the session cookie. Below
 * the `sm` width the places and the account collapse into a menu (a <details>, so it works
 * before any script has loaded) and nothing pushes the page sideways.
 */
export async function SiteHeader() {
  const { user } = await getCurrentSession();
  const email = user?.email ?? null;
  return (
    <header className="border-b border-glaze-line bg-glaze">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:p-2">
        Skip to content
      </a>
      <nav
        aria-label="Main"
        className="mx-auto flex max-w-5xl items-center gap-6 px-4 py-3 sm:px-6"
      >
        <Link href="/" className="font-display text-lg font-semibold text-kiln">
          Craquelure
        </Link>
        <div className="hidden items-center gap-6 sm:flex">
          <Places className="text-sm text-ink-soft hover:text-ink" />
        </div>
        <div className="ml-auto hidden min-w-0 items-center gap-3 text-sm sm:flex">
          <Who email={email} testId="signed-in-as" />
        </div>
        <details className="relative ml-auto sm:hidden" data-testid="header-menu">
          <summary className="cursor-pointer list-none rounded-md border border-glaze-line px-3 py-1 text-sm text-ink-soft">
            Menu
          </summary>
          <div className="absolute right-0 z-20 mt-2 flex w-56 flex-col gap-3 rounded-md border border-glaze-line bg-white p-4 text-sm shadow-md">
            <Places className="text-ink-soft hover:text-ink" />
            <hr className="border-glaze-line" />
            <Who email={email} testId="signed-in-as-menu" />
          </div>
        </details>
      </nav>
    </header>
  );
}
