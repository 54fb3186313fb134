import { beforeEach, describe, expect, it } from "vitest";
import { confirmSignUpAction, signUpAction } from "@/app/(auth)/signup/actions";
import { GET as getSession } from "@/app/api/session/route";
import { db } from "@/db/client";
import { EmailInUseError, createOrganisationWithAdmin } from "@/db/queries/organisations";
import { formArgs } from "../support/access-matrix";
import { freshSignUp, uniqueEmail } from "../support/accounts";
import { firstLink, mailTo } from "../support/mailbox";
import { jsonRequest, outcomeOf, resetRequest } from "../support/next-context";

const count = async (table: string) => Number((await db(table).count({ n: "*" }))[0].n);

beforeEach(() => resetRequest());

describe("sign-up", () => {
  it("creates the organisation and its first admin in one go, signs them in and records it", async () => {
    const email = uniqueEmail("founder");
    const sent = await outcomeOf(() =>
      signUpAction(...(formArgs({ organisationName: "Prairie Post Works", name: "Fern Founder", email: email.toUpperCase(), password: "founder-password", extraRoles: ["designer"] }) as [never, FormData])),
    );
    expect(sent).toMatchObject({ kind: "value", value: { ok: true } });
    // Finding 11 of the hardening issue: the form's answer is the same for every address; the link in the e-mail finishes it.
    const link = firstLink(await mailTo(email, { subject: /Finish creating your organisation/ }));
    resetRequest();
    const outcome = await outcomeOf(() => confirmSignUpAction(...(formArgs({ token: link.split("/signup/")[1] }) as [never, FormData])));
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

  it("does not say that an e-mail is in use: the owner is e-mailed instead, and nothing is created", async () => {
    const before = await count("organisations");
    const outcome = await outcomeOf(() =>
      signUpAction(...(formArgs({ organisationName: "Copycat Co", name: "Cee", email: "designer@demo.pierwise.test", password: "long-enough-password" }) as [never, FormData])),
    );
    expect(outcome.kind).toBe("value");
    const state = (outcome as { value: { fieldErrors?: Record<string, string[]>; values: Record<string, string>; message: string } }).value;
    expect(state.fieldErrors).toBeUndefined();
    expect(state.message).not.toMatch(/already in use/);
    expect(state.values.organisationName).toBe("Copycat Co"); // what was typed comes back
    expect(state.values.password).toBeUndefined(); // but never the password
    expect((await mailTo("designer@demo.pierwise.test", { subject: /Someone tried to create a Pierwise account/ })).text).toMatch(/already has an account/);
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

/**
 * Finding 11 of the hardening issue: sign-up never reveals which addresses have accounts. The
 * answer to the form is the same for a new and an existing address (words, fields, kind of
 * outcome); what differs goes only to the address's inbox.
 */
describe("sign-up without revealing accounts", () => {
  const send = (email: string) => outcomeOf(() =>
    signUpAction(...(formArgs({ organisationName: "Same Answer Co", name: "Sam Answer", email, password: "same-answer-password", extraRoles: ["designer"] }) as [never, FormData])));

  it("answers a new and an existing address alike; the new one gets a link, the owner of the existing one a warning", async () => {
    const fresh = uniqueEmail("newcomer");
    const taken = "engineer@demo.pierwise.test";
    const usersBefore = await count("users");
    const forNew = await send(fresh);
    resetRequest();
    const forTaken = await send(taken);
    const same = (outcome: unknown, email: string) => JSON.stringify(outcome).replaceAll(email, "<e-mail>");
    expect(same(forTaken, taken)).toBe(same(forNew, fresh));
    expect(forNew).toMatchObject({ kind: "value", value: { ok: true } });
    expect(await count("users")).toBe(usersBefore); // nobody is created before the link is used

    const warning = await mailTo(taken, { subject: /Someone tried to create a Pierwise account with your address/ });
    expect(warning.text).toContain("/reset");
    expect(warning.text).not.toMatch(/\/signup\/\S+/); // no link that would create anything
    const link = firstLink(await mailTo(fresh, { subject: /Finish creating your organisation/ }));
    expect(link).toMatch(new RegExp(`^${process.env.APP_URL}/signup/[A-Za-z0-9_-]{43}$`));
    expect(await db("audit_events").where({ action: "sign-up-attempt-existing", subject: taken }).first()).toBeTruthy();
  });

  it("uses a link once: a second use is refused by name and creates nothing", async () => {
    const { token, email } = await freshSignUp();
    const confirm = () => outcomeOf(() => confirmSignUpAction(...(formArgs({ token }) as [never, FormData])));
    expect(await confirm()).toEqual({ kind: "redirect", location: "/admin/members?welcome=1" });
    resetRequest();
    const again = await confirm();
    expect((again as { value: { message: string } }).value.message).toMatch(/already been used/);
    expect(await db("users").where({ email }).count({ n: "*" })).toEqual([{ n: "1" }]);
    // The chosen password's hash leaves the request row once it is used.
    expect((await db("sign_up_requests").where({ email }).first("password_hash")).password_hash).toBeNull();
  });

  it("refuses an expired link, and a link whose address got an account meanwhile, creating nothing", async () => {
    const expired = await freshSignUp({ expiresAt: new Date(Date.now() - 1000) });
    const outcome = await outcomeOf(() => confirmSignUpAction(...(formArgs({ token: expired.token }) as [never, FormData])));
    expect((outcome as { value: { message: string } }).value.message).toMatch(/expired/);
    const raced = await freshSignUp({ email: "installer@demo.pierwise.test" });
    const before = await count("organisations");
    const late = await outcomeOf(() => confirmSignUpAction(...(formArgs({ token: raced.token }) as [never, FormData])));
    expect((late as { value: { message: string } }).value.message).toMatch(/exists already/);
    expect(await count("organisations")).toBe(before);
  });

  it("sends at most three sign-up e-mails an hour to one address, with the same answer every time", async () => {
    const email = uniqueEmail("flooded");
    for (let i = 0; i < 5; i++) expect(await send(email)).toMatchObject({ kind: "value", value: { ok: true } });
    expect(await db("email_outbox").where({ to: email, kind: "sign-up" }).count({ n: "*" })).toEqual([{ n: "3" }]);
  });

  it("keeps no usable sign-up link in the outbox once the e-mail is delivered", async () => {
    const email = uniqueEmail("scrubbed");
    await send(email);
    const token = firstLink(await mailTo(email, { subject: /Finish creating/ })).split("/signup/")[1];
    const row = await db("email_outbox").where({ to: email, kind: "sign-up" }).first();
    expect(row.sent_at).not.toBeNull();
    expect(row.text).not.toContain(token);
    expect(row.text).toContain("[single-use link removed after delivery]");
    expect(row.html ?? "").not.toContain(token);
  });
});
