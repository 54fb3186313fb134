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

export const personNameField = z
  .string({ error: "Your name is required." })
  .trim()
  .min(1, { error: "Your name is required." })
  .max(120, { error: "Your name must be at most 120 characters." });

/** The roles a sign-up may add to the admin role it always gets. */
export const signUpSchema = z.object({
  organisationName: z
    .string({ error: "Company name is required." })
    .trim()
    .min(2, { error: "Company name must be 2 to 120 characters." })
    .max(120, { error: "Company name must be 2 to 120 characters." }),
  name: personNameField,
  email: emailField,
  password: newPasswordField,
  // Not the reviewing-engineer role: nobody grants themselves the right to approve designs; another
  // admin gives it, or an invitation carries it.
  extraRoles: z.array(z.enum(["designer", "installer"], { error: "Extra roles may be designer or installer; another admin gives the reviewing-engineer role." })).default([]),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export function signUpInput(form: FormData) {
  return {
    organisationName: form.get("organisationName") ?? undefined,
    name: form.get("name") ?? undefined,
    email: form.get("email") ?? undefined,
    password: form.get("password") ?? undefined,
    extraRoles: form.getAll("extraRoles"),
  };
}

export const resetRequestSchema = z.object({ email: emailField });

export const newPasswordSchema = z.object({ password: newPasswordField });

/** Accepting an invitation: a new person gives a name and password; an existing one only the password. */
export const acceptAsNewSchema = z.object({ name: personNameField, password: newPasswordField });
export const acceptAsExistingSchema = z.object({
  password: z.string({ error: "Password is required." }).min(1, { error: "Password is required." }),
});
