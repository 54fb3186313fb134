import { z } from "zod";

/** One schema per input, shared by the form, the server action and the route handler. */
export const emailField = z
  .string({ error: "E-mail is required." })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: "E-mail must be an address like name@company.com." }));

export const newPasswordField = z
  .string({ error: "Password is required." })
  .min(10, { error: "Password must be at least 10 characters." })
  .max(200, { error: "Password must be at most 200 characters." });

export const signInSchema = z.object({
  email: emailField,
  password: z.string({ error: "Password is required." }).min(1, { error: "Password is required." }),
});
export type SignInInput = z.infer<typeof signInSchema>;
