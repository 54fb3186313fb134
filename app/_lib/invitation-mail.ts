import { ROLE_LABELS, type Role } from "@/db/roles";

/** The invitation e-mail: plain text, the link on its own line so every mail reader makes it clickable. */
export function invitationMail(input: { inviter: string; organisation: string; roles: Role[]; link: string }) {
  return {
    subject: `${input.inviter} invited you to ${input.organisation} on Pierwise`,
    text: [
      `${input.inviter} invited you to join ${input.organisation} on Pierwise as: ${input.roles.map((r) => ROLE_LABELS[r]).join(", ")}.`,
      "",
      "Open this link to accept (it works once, for 7 days):",
      input.link,
      "",
      "If you did not expect this, ignore this e-mail; nothing happens unless the link is opened and accepted.",
    ].join("\n"),
  };
}
