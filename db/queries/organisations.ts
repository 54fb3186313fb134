import type { Knex } from "knex";
import { db } from "../client";
import type { Role } from "../roles";
import { rolesLiteral } from "./users";

export class EmailInUseError extends Error {
  constructor() {
    super("That e-mail is already in use.");
  }
}

/** True for PostgreSQL's unique_violation, e.g. two sign-ups racing for one e-mail. */
export function isUniqueViolation(error: unknown): boolean {
  return (error as { code?: string })?.code === "23505";
}

/** Sign-up: the organisation, its first admin and the membership, all or nothing. */
export async function createOrganisationWithAdmin(input: {
  organisationName: string;
  name: string;
  email: string;
  passwordHash: string;
  roles: Role[];
}, outer?: Knex.Transaction): Promise<{ organisationId: string; userId: string }> {
  const run = async (trx: Knex.Transaction) => {
    const [organisation] = await trx("organisations").insert({ name: input.organisationName }).returning("id");
    const [user] = await trx("users")
      .insert({ email: input.email, name: input.name, password_hash: input.passwordHash })
      .returning("id");
    await trx("memberships").insert({ organisation_id: organisation.id, user_id: user.id, roles: rolesLiteral(trx, input.roles) });
    return { organisationId: organisation.id as string, userId: user.id as string };
  };
  try {
    return await (outer ? run(outer) : db.transaction(run));
  } catch (error) {
    if (isUniqueViolation(error)) throw new EmailInUseError();
    throw error;
  }
}

/** An organisation's name (e.g. the contractor an outside engineer reviews for). */
export async function organisationName(id: string): Promise<string | undefined> {
  return (await db("organisations").where({ id }).first("name"))?.name;
}
