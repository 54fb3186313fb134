/** What a person reads when an invitation link cannot be used; shared by the page and its action. */
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
