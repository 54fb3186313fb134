import type { Knex } from "knex";
import { hashPassword } from "../password";
import type { Role } from "../roles";

/**
 * Invented demo organisations and people. Every name here is made up for the demo; the README
 * lists the sign-ins. The second organisation exists so cross-organisation access can be tried.
 */
export const DEMO_PASSWORD = "pierwise-demo";
export const DEMO_ORG_ID = "0f5e1c2a-0000-4000-8000-000000000001";
export const OTHER_ORG_ID = "0f5e1c2a-0000-4000-8000-000000000002";

const people: { email: string; name: string; org: string; roles: Role[] }[] = [
  { email: "admin@demo.pierwise.test", name: "Ada Admin", org: DEMO_ORG_ID, roles: ["admin"] },
  { email: "designer@demo.pierwise.test", name: "Dana Designer", org: DEMO_ORG_ID, roles: ["designer"] },
  { email: "engineer@demo.pierwise.test", name: "Eli Engineer, P.E.", org: DEMO_ORG_ID, roles: ["engineer"] },
  { email: "installer@demo.pierwise.test", name: "Ivy Installer", org: DEMO_ORG_ID, roles: ["installer"] },
  { email: "designer@other.pierwise.test", name: "Otto Outsider", org: OTHER_ORG_ID, roles: ["admin", "designer"] },
];

export async function seed(knex: Knex): Promise<void> {
  await knex("organisations").insert([
    { id: DEMO_ORG_ID, name: "Example Ground-Mount Co. (demo)" },
    { id: OTHER_ORG_ID, name: "Other Example Solar Co. (demo)" },
  ]);
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  for (const person of people) {
    const [user] = await knex("users")
      .insert({ email: person.email, name: person.name, password_hash: passwordHash })
      .returning("id");
    await knex("memberships").insert({
      organisation_id: person.org,
      user_id: user.id,
      roles: knex.raw("?::member_role[]", [`{${person.roles.join(",")}}`]),
    });
    if (person.roles.includes("engineer")) {
      await knex("engineer_licences").insert({
        user_id: user.id,
        licence_number: "PE-000000-DEMO",
        state: "CO",
        expires_on: "2030-12-31",
      });
    }
  }
}
