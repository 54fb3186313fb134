import { beforeEach, describe, expect, it } from "vitest";
import { saveLicenceAction } from "@/app/(workspace)/account/actions";
import AccountPage from "@/app/(workspace)/account/page";
import { db } from "@/db/client";
import { approvalEligibility, listLicences } from "@/db/queries/licences";
import { formArgs } from "../support/access-matrix";
import { freshMember } from "../support/accounts";
import { actAs, outcomeOf, resetRequest } from "../support/next-context";

// The licence numbers, states and dates below are invented test data, not published values.
type State = { ok?: boolean; message?: string; fieldErrors?: Record<string, string[]> };
const save = async (fields: Record<string, string>) =>
  ((await outcomeOf(() => saveLicenceAction(...(formArgs(fields) as [never, FormData])))) as { value: State }).value;

beforeEach(() => resetRequest());

describe("engineer licences and approvalEligibility", () => {
  it("allows approval only in a state where an unexpired licence is held, saying why not otherwise", async () => {
    const engineer = await freshMember({ roles: ["engineer"] });
    await db("engineer_licences").insert([
      { user_id: engineer.userId, state: "CO", licence_number: "PE-11111", expires_on: "2027-06-30" },
      { user_id: engineer.userId, state: "UT", licence_number: "PE-22222", expires_on: "2026-03-31" },
    ]);
    const asOf = new Date("2026-06-01T12:00:00Z");
    expect(await approvalEligibility(engineer.userId, "CO", asOf)).toMatchObject({ ok: true, licence: { state: "CO", licenceNumber: "PE-11111" } });
    expect(await approvalEligibility(engineer.userId, "co", asOf)).toMatchObject({ ok: true }); // state codes in any case
    expect(await approvalEligibility(engineer.userId, "UT", asOf)).toEqual({
      ok: false,
      reason: "Licence PE-22222 (UT) expired on 2026-03-31. Renew it and update the expiry on your account page.",
    });
    expect(await approvalEligibility(engineer.userId, "TX", asOf)).toEqual({
      ok: false,
      reason: "No licence held in TX: an approval needs a licence in the project's state. Add it on your account page.",
    });
  });

  it("counts the expiry date itself as a valid day and the day after as expired", async () => {
    const engineer = await freshMember({ roles: ["engineer"] });
    await db("engineer_licences").insert({ user_id: engineer.userId, state: "NV", licence_number: "PE-33333", expires_on: "2026-12-31" });
    expect((await approvalEligibility(engineer.userId, "NV", new Date("2026-12-31T23:00:00Z"))).ok).toBe(true);
    expect((await approvalEligibility(engineer.userId, "NV", new Date("2027-01-01T00:30:00Z"))).ok).toBe(false);
  });

  it("the demo engineer can approve in CO and not elsewhere", async () => {
    const id = (await db("users").where({ email: "engineer@demo.pierwise.test" }).first("id")).id;
    expect((await approvalEligibility(id, "CO", new Date("2026-12-01T00:00:00Z"))).ok).toBe(true);
    expect((await approvalEligibility(id, "KS", new Date("2026-12-01T00:00:00Z"))).ok).toBe(false);
  });

  it("an engineer records and updates a licence through the account form; bad fields are named", async () => {
    const engineer = await freshMember({ roles: ["engineer"] });
    await actAs(engineer.email);
    expect(await save({ state: "az", licenceNumber: "PE-44444", expiresOn: "2028-01-31" })).toMatchObject({ ok: true });
    expect(await save({ state: "AZ", licenceNumber: "PE-44444-R", expiresOn: "2030-01-31" })).toMatchObject({ ok: true });
    expect(await listLicences(engineer.userId)).toEqual([{ state: "AZ", licenceNumber: "PE-44444-R", expiresOn: "2030-01-31" }]);
    const bad = await save({ state: "ZZ", licenceNumber: "", expiresOn: "31/01/2030" });
    expect(bad.fieldErrors?.state?.[0]).toMatch(/US state, DC or territory code/);
    expect(bad.fieldErrors?.licenceNumber?.[0]).toMatch(/2 to 40 characters/);
    expect(bad.fieldErrors?.expiresOn?.[0]).toMatch(/date such as 2027-12-31/);
  });

  it("the account page is for any signed-in member; signed out goes to sign-in", async () => {
    await actAs("installer@demo.pierwise.test");
    expect((await outcomeOf(() => AccountPage())).kind).toBe("value");
    await actAs(null);
    expect(await outcomeOf(() => AccountPage())).toEqual({ kind: "redirect", location: "/login?next=%2Faccount" });
  });
});
