/**
 * Issue 12, finding 9, on the form path: a NUL or another control character in a text field of a
 * server-action form is refused beside that field with the JSON API's words (app/_lib/request-guards.ts),
 * and nothing is written. Before, PostgreSQL refused the NUL ("invalid byte sequence") and the form
 * got a 500, while other control characters were stored.
 */
import { beforeEach, describe, expect, it } from "vitest";
import { acceptInvitationAction } from "@/app/(auth)/invite/[token]/actions";
import { signUpAction } from "@/app/(auth)/signup/actions";
import { saveLicenceAction } from "@/app/(workspace)/account/actions";
import { createProjectAction } from "@/app/(workspace)/projects/actions";
import { CONTROL_CHARACTERS_MESSAGE } from "@/app/_lib/request-guards";
import { db } from "@/db/client";
import { formArgs } from "../support/access-matrix";
import { freshInvitation, uniqueEmail } from "../support/accounts";
import { actAs, outcomeOf, resetRequest } from "../support/next-context";
import { DESIGNER, ENGINEER } from "../support/review-fixtures";

type State = { fieldErrors?: Record<string, string[]>; values?: Record<string, string> };
beforeEach(() => resetRequest());

async function stateOf(run: () => Promise<unknown>): Promise<State> {
  const outcome = await outcomeOf(run);
  expect(outcome.kind, JSON.stringify(outcome)).toBe("value");
  return (outcome as { value: State }).value;
}

describe("control characters in form posts", () => {
  it("a new project with a NUL in its name or a bell in its notes: refused beside the field, nothing saved", async () => {
    await actAs(DESIGNER);
    const name = `Meadow site ${Date.now()}`;
    const nul = await stateOf(() => createProjectAction(...(formArgs({ name: `${name}\u0000`, state: "CO", address: "1 Test Lane (invented)" }) as [never, FormData])));
    expect(nul.fieldErrors).toEqual({ name: [CONTROL_CHARACTERS_MESSAGE] });
    expect(nul.values?.state).toBe("CO"); // what was typed comes back
    const bell = await stateOf(() => createProjectAction(...(formArgs({ name, state: "CO", notes: "ring\u0007" }) as [never, FormData])));
    expect(bell.fieldErrors).toEqual({ notes: [CONTROL_CHARACTERS_MESSAGE] });
    expect(await db("projects").where("name", "like", `${name}%`).first()).toBeUndefined();
    // Tabs and line breaks are text, not control characters to refuse.
    const fine = await outcomeOf(() => createProjectAction(...(formArgs({ name, state: "CO", notes: "line one\r\nline two\tend" }) as [never, FormData])));
    expect(fine.kind).toBe("redirect");
  });

  it("sign-up, invitation and licence forms (not run through forAction) refuse them too", async () => {
    const signUp = await stateOf(() => signUpAction(...(formArgs({ organisationName: "Null\u0000 Co", name: "Nia", email: uniqueEmail("nul"), password: "long-enough-password" }) as [never, FormData])));
    expect(signUp.fieldErrors).toEqual({ organisationName: [CONTROL_CHARACTERS_MESSAGE] });
    expect(await db("organisations").where({ name: "Null\u0000 Co".replace("\u0000", "") }).first()).toBeUndefined();

    const invitation = await freshInvitation();
    const accept = await stateOf(() => acceptInvitationAction(...(formArgs({ token: invitation.token, name: "In\u0000vitee", password: "long-enough-password" }) as [never, FormData])));
    expect(accept.fieldErrors).toEqual({ name: [CONTROL_CHARACTERS_MESSAGE] });
    expect((await db("invitations").where({ id: invitation.id }).first("accepted_at")).accepted_at).toBeNull();

    await actAs(ENGINEER);
    const licence = await stateOf(() => saveLicenceAction(...(formArgs({ state: "WY", licenceNumber: "PE-\u001b-1", expiresOn: "2030-12-31" }) as [never, FormData])));
    expect(licence.fieldErrors).toEqual({ licenceNumber: [CONTROL_CHARACTERS_MESSAGE] });
  });
});
