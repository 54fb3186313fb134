import { z } from "zod";
import { emailField, newPasswordField, personNameField } from "./account";
import { licenceSchema } from "./licence";

/** Engaging an outside engineer on a project: shared by the project page's form and the API. */
export const engagementSchema = z.object({
  email: emailField,
  message: z.string({ error: "The message must be text." }).trim().max(2000, { error: "The message must be at most 2000 characters." }).default(""),
});
export type EngagementInput = z.infer<typeof engagementSchema>;

/**
 * Signing up from an engagement link: the engineer, as an individual (their own one-person
 * organisation) or as their engineering firm (an organisation they then invite colleagues to),
 * with their own licence. The e-mail is the one the engagement was sent to.
 */
export const engineerSignUpSchema = z
  .object({
    kind: z.enum(["individual", "firm"], { error: "Choose whether you sign up as yourself or as your engineering firm." }),
    firmName: z.string().trim().max(120, { error: "Firm name must be at most 120 characters." }).default(""),
    name: personNameField,
    password: newPasswordField,
  })
  .and(licenceSchema)
  .superRefine((v, ctx) => {
    if (v.kind === "firm" && v.firmName.length < 2) ctx.addIssue({ code: "custom", path: ["firmName"], message: "Firm name must be 2 to 120 characters." });
  });
export type EngineerSignUpInput = z.infer<typeof engineerSignUpSchema>;

export function engineerSignUpInput(form: FormData) {
  const field = (k: string) => form.get(k) ?? undefined;
  return {
    kind: field("kind"), firmName: field("firmName"), name: field("name"), password: field("password"),
    state: field("state"), licenceNumber: field("licenceNumber"), expiresOn: field("expiresOn"),
  };
}
