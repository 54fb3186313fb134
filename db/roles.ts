/** The roles a member can hold; a person may hold several. Also the database enum `member_role`. */
export const ROLES = ["admin", "designer", "engineer", "installer"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Admin",
  designer: "Designer",
  engineer: "Reviewing engineer",
  installer: "Installer",
};
