/**
 * A home per role after sign-in, and menus that offer only what the role can use (the crew's menu
 * had Criteria and Reviews; every role landed on Projects).
 */
import { describe, expect, it } from "vitest";
import { homeFor, menuFor } from "@/components/ui/role-navigation";

const labels = (roles: Parameters<typeof menuFor>[0]) => menuFor(roles).map((l) => l.label);

describe("role navigation", () => {
  it("sends each role to its own home", () => {
    expect(homeFor(["designer"])).toBe("/projects");
    expect(homeFor(["engineer"])).toBe("/queue");
    expect(homeFor(["installer"])).toBe("/field");
    expect(homeFor(["admin"])).toBe("/admin/members");
    // Several roles: the first in the order designer, engineer, installer, admin.
    expect(homeFor(["admin", "designer"])).toBe("/projects");
    expect(homeFor(["installer", "engineer"])).toBe("/queue");
  });

  it("shows the crew only the field specs", () => {
    expect(labels(["installer"])).toEqual(["Field specs"]);
  });

  it("gives an engineer the queue first and no criteria cards", () => {
    expect(labels(["engineer"])).toEqual(["Review queue", "Projects", "Reviews", "Field specs"]);
  });

  it("joins the menus of several roles without repeats", () => {
    expect(labels(["admin", "designer"])).toEqual(["Projects", "Criteria", "Reviews", "Field specs", "Members", "Audit log"]);
  });
});
