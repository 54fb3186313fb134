import type { ResetState } from "@/db/queries/password-resets";

/**
 * What a person reads when an e-mailed link cannot be used; shared by the pages that show the link
 * and the services that use it (app/_lib/services/{invitations,password-reset,sign-up}.ts).
 */
export function invitationProblem(reason: "unknown" | "used" | "expired" | "email-in-use", organisation?: string): string {
  switch (reason) {
    case "used":
      return "This invitation has already been used. Sign in with the e-mail it was sent to; if that was not you, ask your admin for a new invitation.";
    case "expired":
      return `This invitation has expired (links work for 7 days). Ask an admin of ${organisation ?? "the organisation"} to send a new one.`;
    case "email-in-use":
      return "An account with this e-mail was created meanwhile. Reload this page and sign in with that account's password to join.";
    default:
      return "This invitation link is not valid. Check that you opened the whole link from the e-mail, or ask your admin for a new invitation.";
  }
}

export function resetProblem(state: Exclude<ResetState, "valid">): string {
  if (state === "used") return "This reset link has already been used. Links work once: ask for a new one if you still need it.";
  if (state === "expired") return "This reset link has expired (links work for 1 hour). Ask for a new one below.";
  return "This reset link is not valid. Check that you opened the whole link from the e-mail, or ask for a new one.";
}

export function signUpProblem(reason: "unknown" | "used" | "expired" | "email-in-use"): string {
  switch (reason) {
    case "used":
      return "This link has already been used: the organisation exists. Sign in with the e-mail and password you chose.";
    case "expired":
      return "This link has expired (links work for 24 hours). Fill in the sign-up form again to get a new one.";
    case "email-in-use":
      return "An account with this e-mail exists already, so no new organisation was made. Sign in instead, or reset your password.";
    default:
      return "This sign-up link is not valid. Check that you opened the whole link from the e-mail, or fill in the sign-up form again.";
  }
}
