import { ROLE_LABELS, type Role } from "@/db/roles";

const ROLE_HINTS: Record<Role, string> = {
  admin: "invites members, changes roles, reads the audit log",
  designer: "creates projects and designs",
  engineer: "reviews and approves designs (needs a licence in the project's state)",
  installer: "reads approved field specs",
};

/** A group of role checkboxes with its error beside it. */
export function RoleCheckboxes({
  name,
  roles,
  checked = [],
  legend = "Roles",
  error,
  idPrefix = name,
  compact = false,
}: {
  name: string;
  roles: readonly Role[];
  checked?: readonly string[];
  legend?: string;
  error?: string[];
  idPrefix?: string;
  compact?: boolean;
}) {
  return (
    <fieldset aria-describedby={error?.length ? `${idPrefix}-error` : undefined} className="space-y-1">
      <legend className="text-sm font-medium text-slate-800">{legend}</legend>
      <div className={compact ? "flex flex-wrap gap-x-4 gap-y-1" : "space-y-1"}>
        {roles.map((role) => (
          <label key={role} className="flex items-start gap-2 text-sm">
            <input type="checkbox" name={name} value={role} defaultChecked={checked.includes(role)} className="mt-0.5 size-4 shrink-0 accent-accent-700" />
            <span>
              {ROLE_LABELS[role]}
              {compact ? null : <span className="text-slate-500"> — {ROLE_HINTS[role]}</span>}
            </span>
          </label>
        ))}
      </div>
      {error?.length ? <p id={`${idPrefix}-error`} className="text-sm text-red-700">{error.join(" ")}</p> : null}
    </fieldset>
  );
}
