import { beforeEach, describe, expect, it } from "vitest";
import { signUpAction } from "@/app/(auth)/signup/actions";
import { GET as getSession } from "@/app/api/session/route";
import { db } from "@/db/client";
import { EmailInUseError, createOrganisationWithAdmin } from "@/db/queries/organisations";
import { formArgs } from "../support/access-matrix";
import { uniqueEmail } from "../support/accounts";
import { jsonRequest, outcomeOf, resetRequest } from "../support/next-context";

const count = async (table: string) => Number((await db(table).count({ n: "*" }))[0].n);

beforeEach(() => resetRequest());

describe("sign-up", () => {
  it("creates the organisation and its first admin in one go, signs them in and records it", async () => {
    const email = uniqueEmail("founder");
    const outcome = await outcomeOf(() =>
      signUpAction(...(formArgs({ organisationName: "Prairie Post Works", name: "Fern Founder", email: email.toUpperCase(), password: "founder-password", extraRoles: ["designer"] }) as [never, FormData])),
    );
    expect(outcome).toEqual({ kind: "redirect", location: "/admin/members?welcome=1" });
    const me = await (await getSession(jsonRequest("GET", "/api/session"), {})).json();
    expect(me.user.email).toBe(email); // stored lower-cased
    expect(me.organisation.name).toBe("Prairie Post Works");
    expect(me.roles).toEqual(["admin", "designer"]);
    const user = await db("users").where({ email }).first("password_hash");
    expect(user.password_hash).toMatch(/^\$argon2id\$/);
    expect(user.password_hash).not.toContain("founder-password");
    expect(await db("audit_events").where({ action: "sign-up", subject: email }).first()).toBeTruthy();
  });

  it("says beside the field that an e-mail is in use and creates nothing", async () => {
    const before = await count("organisations");
    const outcome = await outcomeOf(() =>
      signUpAction(...(formArgs({ organisationName: "Copycat Co", name: "Cee", email: "designer@demo.pierwise.test", password: "long-enough-password" }) as [never, FormData])),
    );
    expect(outcome.kind).toBe("value");
    const state = (outcome as { value: { fieldErrors: Record<string, string[]>; values: Record<string, string> } }).value;
    expect(state.fieldErrors.email[0]).toMatch(/already in use/);
    expect(state.values.organisationName).toBe("Copycat Co"); // what was typed comes back
    expect(state.values.password).toBeUndefined(); // but never the password
    expect(await count("organisations")).toBe(before);
  });

  it("rejects a password under 10 characters beside the field, and other bad fields by name", async () => {
    const before = await count("users");
    const outcome = await outcomeOf(() => signUpAction(...(formArgs({ organisationName: "X", name: "", email: "nope", password: "short" }) as [never, FormData])));
    const { fieldErrors } = (outcome as { value: { fieldErrors: Record<string, string[]> } }).value;
    expect(fieldErrors.password).toEqual(["Password must be at least 10 characters."]);
    expect(fieldErrors.organisationName[0]).toMatch(/2 to 120 characters/);
    expect(fieldErrors.name[0]).toMatch(/required/);
    expect(fieldErrors.email[0]).toMatch(/name@company.com/);
    expect(await count("users")).toBe(before);
  });

  it("rolls the organisation back when the user cannot be created (an e-mail taken by a racing sign-up)", async () => {
    const before = await count("organisations");
    await expect(
      createOrganisationWithAdmin({ organisationName: "Race Co", name: "R", email: "installer@demo.pierwise.test", passwordHash: "$argon2id$x", roles: ["admin"] }),
    ).rejects.toBeInstanceOf(EmailInUseError);
    expect(await count("organisations")).toBe(before);
  });
});
