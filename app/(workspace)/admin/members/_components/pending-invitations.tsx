"use client";

import { useActionState } from "react";
import { FormStatus, type ActionState } from "@/components/ui/form";
import { ROLE_LABELS, type Role } from "@/db/roles";
import { revokeInvitationAction } from "../actions";

interface Pending {
  id: string;
  email: string;
  roles: Role[];
  expiresAt: string;
  invitedByName: string;
}

export function PendingInvitations({ invitations }: { invitations: Pending[] }) {
  if (invitations.length === 0) return null;
  return (
    <section aria-labelledby="pending-heading" className="mt-6">
      <h2 id="pending-heading" className="text-lg font-semibold">Invitations waiting for an answer</h2>
      <ul className="mt-2 divide-y divide-slate-200 rounded-lg border border-slate-200 bg-white">
        {invitations.map((i) => <PendingRow key={i.id} invitation={i} />)}
      </ul>
    </section>
  );
}

function PendingRow({ invitation }: { invitation: Pending }) {
  const [state, action] = useActionState<ActionState, FormData>(revokeInvitationAction, {});
  return (
    <li className="flex flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3 text-sm">
      <span className="font-medium break-all">{invitation.email}</span>
      <span className="text-slate-600">{invitation.roles.map((r) => ROLE_LABELS[r]).join(", ")}</span>
      <span className="text-slate-500">
        invited by {invitation.invitedByName}, link works until <time dateTime={invitation.expiresAt}>{invitation.expiresAt.slice(0, 10)}</time>
      </span>
      <form action={action} className="ml-auto flex items-center gap-2">
        <input type="hidden" name="invitationId" value={invitation.id} />
        <FormStatus state={state} />
        <button type="submit" className="rounded-md border border-slate-300 px-3 py-1 hover:bg-slate-50">Cancel invitation</button>
      </form>
    </li>
  );
}
