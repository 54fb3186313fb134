"use client";

import { useActionState } from "react";
import { FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";
import { RoleCheckboxes } from "@/components/ui/role-checkboxes";
import type { MemberRow } from "@/db/queries/members";
import { ROLE_LABELS, ROLES } from "@/db/roles";
import { changeRolesAction } from "../actions";

/** The member's roles, with a disclosure to change them (the server refuses to drop the last admin). */
export function RoleEditor({ member, isSelf }: { member: MemberRow; isSelf: boolean }) {
  const [state, action] = useActionState<ActionState, FormData>(changeRolesAction, {});
  const label = member.roles.map((r) => ROLE_LABELS[r]).join(", ");
  if (member.deactivatedAt) return <span className="text-slate-500">{label}</span>;
  return (
    <div>
      <details>
        <summary className="cursor-pointer">
          {label} <span className="text-accent-700 underline">change</span>
        </summary>
        <form action={action} className="mt-2 space-y-2">
          <input type="hidden" name="membershipId" value={member.membershipId} />
          <RoleCheckboxes name="roles" idPrefix={`roles-${member.membershipId}`} legend={isSelf ? "Your roles" : `Roles of ${member.name}`} roles={ROLES} checked={member.roles} error={state.fieldErrors?.roles} compact />
          <SubmitButton pendingText="Saving…">Save roles</SubmitButton>
        </form>
      </details>
      <FormStatus state={state} />
    </div>
  );
}
