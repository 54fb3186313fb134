import { z } from "zod";
import { ROLES } from "@/db/roles";
import { emailField } from "./account";

export const rolesField = z
  .array(z.enum(ROLES, { error: `Roles must be among: ${ROLES.join(", ")}.` }), { error: "Choose at least one role." })
  .min(1, { error: "Choose at least one role." });

export const inviteSchema = z.object({ email: emailField, roles: rolesField });
export function inviteInput(form: FormData) {
  return { email: form.get("email") ?? undefined, roles: form.getAll("roles") };
}

export const idField = z.uuid({ error: "That member or invitation id is not valid." });

export const changeRolesSchema = z.object({ membershipId: idField, roles: rolesField });
export function changeRolesInput(form: FormData) {
  return { membershipId: form.get("membershipId") ?? undefined, roles: form.getAll("roles") };
}

/** The API's PATCH of a membership: new roles, or active true/false; one of them per request. */
export const memberPatchSchema = z
  .strictObject({ roles: rolesField.optional(), active: z.boolean({ error: "active must be true or false." }).optional() })
  .refine((p) => (p.roles === undefined) !== (p.active === undefined), { error: "Send either roles or active, one per request.", path: ["roles"] });
