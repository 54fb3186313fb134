import type { Role } from "@/db/roles";

/**
 * Where each role starts and what its menu offers: one table, read by the signed-in shell and by
 * sign-in. A person with several roles gets the union of their menus, and the home of their first
 * role in this order (designers design, engineers review, crews build, admins administer).
 */
export interface NavLink {
  href: string;
  label: string;
}

const LINKS = {
  projects: { href: "/projects", label: "Projects" },
  criteria: { href: "/criteria", label: "Criteria" },
  queue: { href: "/queue", label: "Review queue" },
  reviews: { href: "/reviews", label: "Reviews" },
  field: { href: "/field", label: "Field specs" },
  members: { href: "/admin/members", label: "Members" },
  audit: { href: "/admin/audit", label: "Audit log" },
} satisfies Record<string, NavLink>;

type LinkKey = keyof typeof LINKS;

const MENU: Record<Role, LinkKey[]> = {
  designer: ["projects", "criteria", "reviews", "field"],
  engineer: ["queue", "reviews", "projects", "field"],
  installer: ["field"],
  admin: ["members", "audit", "projects"],
};

const HOME_ORDER: { role: Role; home: string }[] = [
  { role: "designer", home: "/projects" },
  { role: "engineer", home: "/queue" },
  { role: "installer", home: "/field" },
  { role: "admin", home: "/admin/members" },
];

/** The page a person lands on after sign-in (and the brand link's target). */
export function homeFor(roles: readonly Role[]): string {
  return HOME_ORDER.find((h) => roles.includes(h.role))?.home ?? "/projects";
}

/** The menu for a person's roles, in a stable order, without repeats. */
export function menuFor(roles: readonly Role[]): NavLink[] {
  const order: LinkKey[] = ["queue", "projects", "criteria", "reviews", "field", "members", "audit"];
  const wanted = new Set(roles.flatMap((r) => MENU[r] ?? []));
  return order.filter((k) => wanted.has(k)).map((k) => LINKS[k]);
}
