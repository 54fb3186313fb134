import { composeMail } from "@/app/_lib/mail-template";
import { ROLE_LABELS, type Role } from "@/db/roles";

/** The invitation e-mail: HTML with the button and plain text with the link on its own line. */
export function invitationMail(input: { inviter: string; organisation: string; roles: Role[]; link: string }) {
  return composeMail({
    subject: `${input.inviter} invited you to ${input.organisation} on Pierwise`,
    heading: `Join ${input.organisation} on Pierwise`,
    paragraphs: [
      `${input.inviter} invited you to join ${input.organisation} on Pierwise as: ${input.roles.map((r) => ROLE_LABELS[r]).join(", ")}.`,
      "The link works once, for 7 days.",
    ],
    action: { label: "Accept the invitation", url: input.link },
    footnote: "If you did not expect this, ignore this e-mail; nothing happens unless the link is opened and accepted.",
  });
}
