import type { Metadata } from "next";
import Link from "next/link";
import { requireUser } from "@/app/_lib/auth";
import { forPage, refusable } from "@/app/_lib/page-access";
import { membersOverview } from "@/app/_lib/services/members";
import { InviteForm } from "./_components/invite-form";
import { MembersTable } from "./_components/members-table";
import { PendingInvitations } from "./_components/pending-invitations";

export const metadata: Metadata = { title: "Members" };

async function MembersPage({ searchParams }: { searchParams: Promise<{ welcome?: string }> }) {
  const { user, members, invitations } = await forPage(async () => {
    const user = await requireUser();
    return { user, ...(await membersOverview(user)) };
  }, "/admin/members");
  const { welcome } = await searchParams;
  return (
    <>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="text-2xl font-semibold">Members of {user.organisationName}</h1>
        <Link href="/admin/audit" className="text-sm text-accent-700 underline">Audit log</Link>
      </div>
      {welcome ? (
        <p className="mt-3 rounded-md border border-accent-100 bg-accent-50 px-3 py-2 text-sm text-accent-900">
          Your organisation is ready. Invite the people who design, review and build with you.
        </p>
      ) : null}
      <section aria-labelledby="invite-heading" className="mt-6 rounded-lg border border-slate-200 bg-white p-4">
        <h2 id="invite-heading" className="text-lg font-semibold">Invite someone</h2>
        <p className="mt-1 text-sm text-slate-600">They get an e-mail with a link that works once, for 7 days.</p>
        <InviteForm />
      </section>
      <PendingInvitations invitations={invitations.map((i) => ({ id: i.id, email: i.email, roles: i.roles, expiresAt: i.expiresAt.toISOString(), invitedByName: i.invitedByName }))} />
      <section aria-labelledby="members-heading" className="mt-8">
        <h2 id="members-heading" className="text-lg font-semibold">Members</h2>
        <p className="mt-1 text-sm text-slate-600">
          Deactivated members cannot sign in; what they designed, reviewed or built stays attributed to them.
        </p>
        <MembersTable members={members} currentUserId={user.userId} />
      </section>
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(MembersPage);
