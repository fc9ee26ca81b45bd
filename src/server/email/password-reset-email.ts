import "server-only";
import { renderEmail, type TEmailMessage } from "./message";

export function passwordResetEmail(input: { to: string; url: string; expiresAt: Date }): TEmailMessage {
  return {
    kind: "password_reset",
    to: input.to,
    subject: "Choose a new Filmsheet password",
    ...renderEmail({
      heading: "Choose a new password",
      paragraphs: [
        "Someone asked to reset the password of the Filmsheet account for this address. Follow the link to choose a new one; every device signed in to the account is then signed out.",
      ],
      action: { label: "Choose a new password", url: input.url },
      note: `The link works once and expires at ${input.expiresAt.toUTCString()}. If you did not ask for it, ignore this e-mail: your password stays as it is.`,
    }),
  };
}
