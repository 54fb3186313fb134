import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { acceptInvitationAction } from "@/app/(auth)/invite/[token]/actions";
import { POST } from "@/app/api/session/route";
import { db } from "@/db/client";
import { THROTTLE } from "@/db/queries/sign-in-throttle";
import { DEMO_PASSWORD, OTHER_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { formArgs } from "../support/access-matrix";
import { FRESH_PASSWORD, freshInvitation, freshMember, uniqueEmail } from "../support/accounts";
import { jsonRequest, outcomeOf, resetRequest } from "../support/next-context";

beforeEach(async () => {
  await db("sign_in_failures").delete();
});
afterAll(async () => {
  await db("sign_in_failures").delete();
});

describe("sign-in throttling beyond one account", () => {
  it(`slows down one address after ${THROTTLE.perAddress} failures across many e-mails, without saying which exist`, async () => {
    resetRequest({ ip: "192.0.2.50" });
    for (let i = 0; i < THROTTLE.perAddress; i++) {
      const r = await POST(jsonRequest("POST", "/api/session", { email: uniqueEmail("spray"), password: "guess-password" }), {});
      expect(r.status).toBe(401);
    }
    const blocked = await POST(jsonRequest("POST", "/api/session", { email: "admin@demo.pierwise.test", password: DEMO_PASSWORD }), {});
    expect(blocked.status).toBe(429);
    resetRequest({ ip: "192.0.2.51" }); // another address is not held back
    expect((await POST(jsonRequest("POST", "/api/session", { email: "admin@demo.pierwise.test", password: DEMO_PASSWORD }), {})).status).toBe(200);
  });

  it("counts wrong passwords typed on an invitation page against the account too", async () => {
    const { email } = await freshMember({ organisationId: OTHER_ORG_ID });
    resetRequest({ ip: "192.0.2.60" });
    for (let i = 0; i < THROTTLE.perEmail; i++) {
      const { token } = await freshInvitation({ email });
      await outcomeOf(() => acceptInvitationAction(...(formArgs({ token, password: `wrong-${i}` }) as [never, FormData])));
    }
    const { token } = await freshInvitation({ email });
    const outcome = await outcomeOf(() => acceptInvitationAction(...(formArgs({ token, password: FRESH_PASSWORD }) as [never, FormData])));
    expect((outcome as { value: { message: string } }).value.message).toMatch(/Too many failed attempts/);
  });
});
