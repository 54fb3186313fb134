"use client";

import { useActionState } from "react";
import { FormStatus, type ActionState } from "@/components/ui/form";
import type { MemberRow } from "@/db/queries/members";
import { deactivateMemberAction, reactivateMemberAction } from "../actions";

export function MemberStatusButton({ member }: { member: MemberRow }) {
  const active = !member.deactivatedAt;
  const [state, action] = useActionState<ActionState, FormData>(active ? deactivateMemberAction : reactivateMemberAction, {});
  return (
    <form
      action={action}
      onSubmit={(e) => {
        if (active && !window.confirm(`Deactivate ${member.name}? They will no longer be able to sign in.`)) e.preventDefault();
      }}
      className="space-y-1"
    >
      <input type="hidden" name="membershipId" value={member.membershipId} />
      <button type="submit" className="whitespace-nowrap rounded-md border border-slate-300 px-3 py-1 hover:bg-slate-50">
        {active ? "Deactivate" : "Reactivate"}
      </button>
      <FormStatus state={state} />
    </form>
  );
}
