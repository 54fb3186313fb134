import Link from "next/link";
import { currentUser } from "@/app/_lib/auth";
import { signOutAction } from "@/app/(auth)/login/actions";
import { Brand } from "@/components/ui/brand";
import { SkipLink } from "@/components/ui/skip-link";
import { ROLE_LABELS } from "@/db/roles";
import { homeFor, menuFor } from "@/components/ui/role-navigation";

/**
 * The signed-in shell. It shows who is signed in; every page below checks access itself next to its
 * query (layouts do not re-render on navigation). There is no loading.tsx in the workspace on
 * purpose: a loading boundary streams the answer before the page runs, so a missing or forbidden page
 * would answer 200 instead of 404/403, and without JavaScript the page would stay hidden behind the
 * loading shell (forms must work without scripts). Pages answer in tens of milliseconds, so the whole
 * page is rendered before anything is sent.
 */
export default async function WorkspaceLayout({ children }: { children: React.ReactNode }) {
  const user = await currentUser();
  return (
    <div className="min-h-screen">
      <SkipLink />
      <header className="no-print border-b border-slate-200 bg-white">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
          <Brand href={homeFor(user?.roles ?? [])} />
          <nav aria-label="Main" className="flex flex-wrap gap-4 text-sm">
            {menuFor(user?.roles ?? []).map((link) => <Link key={link.href} href={link.href} className="hover:text-accent-700">{link.label}</Link>)}
          </nav>
          {user ? (
            <div className="ml-auto flex items-center gap-3 text-sm">
              <Link href="/account" className="text-slate-600 hover:text-accent-700" title="Your account and licences">
                {user.name} · {user.organisationName}
                <span className="ml-1 text-xs text-slate-500">({user.roles.map((r) => ROLE_LABELS[r]).join(", ")})</span>
              </Link>
              <form action={signOutAction}>
                <button type="submit" className="rounded-md border border-slate-300 px-3 py-1 hover:bg-slate-50">Sign out</button>
              </form>
            </div>
          ) : null}
        </div>
      </header>
      <main id="content" tabIndex={-1} className="mx-auto max-w-6xl px-4 py-6 focus:outline-none">{children}</main>
    </div>
  );
}
