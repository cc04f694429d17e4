// The e-mail that carries an invitation link to a show role.
import "server-only";
import { env } from "@/lib/env";
import { linkMail, sendMail } from "@/lib/mail";
import { ROLE_LABELS } from "@/lib/schemas/show";
import type { ShowRole } from "@/db/schema";

export async function sendInvitationMail(opts: {
  email: string;
  role: ShowRole;
  showName: string;
  inviterName: string;
  token: string;
}): Promise<void> {
  const url = new URL(`/invitations/${opts.token}`, env.APP_URL).toString();
  const role = ROLE_LABELS[opts.role];
  await sendMail({
    to: opts.email,
    subject: `You're invited: ${role} at ${opts.showName}`,
    fromName: opts.showName,
    ...linkMail({
      heading: `${role} at ${opts.showName}`,
      lines: [
        `${opts.inviterName} has invited ${opts.email} to be ${/^[AEIOU]/.test(role) ? "an" : "a"} ${role.toLowerCase()} at ${opts.showName} on Ribbonry.`,
        "Open the link to sign in or create an account with this e-mail address, then accept. The link works for 14 days.",
      ],
      linkText: "See the invitation",
      url,
    }),
  });
}
