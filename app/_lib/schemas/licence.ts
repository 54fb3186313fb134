import { z } from "zod";

/** US states, DC and territories that license professional engineers, by postal code. */
export const LICENSING_STATES = [
  "AL", "AK", "AZ", "AR", "CA", "CO", "CT", "DE", "DC", "FL", "GA", "HI", "ID", "IL", "IN", "IA", "KS", "KY", "LA", "ME",
  "MD", "MA", "MI", "MN", "MS", "MO", "MT", "NE", "NV", "NH", "NJ", "NM", "NY", "NC", "ND", "OH", "OK", "OR", "PA", "RI",
  "SC", "SD", "TN", "TX", "UT", "VT", "VA", "WA", "WV", "WI", "WY", "GU", "PR", "VI", "MP", "AS",
] as const;

export const licenceSchema = z.object({
  state: z
    .string({ error: "Licensing state is required." })
    .trim()
    .toUpperCase()
    .pipe(z.enum(LICENSING_STATES, { error: "Licensing state must be a US state, DC or territory code such as CO." })),
  licenceNumber: z
    .string({ error: "Licence number is required." })
    .trim()
    .min(2, { error: "Licence number must be 2 to 40 characters." })
    .max(40, { error: "Licence number must be 2 to 40 characters." }),
  expiresOn: z.iso.date({ error: "Expiry date must be a date such as 2027-12-31." }),
});
export type LicenceInput = z.infer<typeof licenceSchema>;

export function licenceInput(form: FormData) {
  return { state: form.get("state") ?? undefined, licenceNumber: form.get("licenceNumber") ?? undefined, expiresOn: form.get("expiresOn") ?? undefined };
}
