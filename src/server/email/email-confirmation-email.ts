import "server-only";
import { renderEmail, type TEmailMessage } from "./message";

export function emailConfirmationEmail(input: { to: string; firmName: string; url: string; expiresAt: Date }): TEmailMessage {
  return {
    kind: "email_confirmation",
    to: input.to,
    subject: "Confirm your e-mail address for Filmsheet",
    ...renderEmail({
      heading: "Confirm your address",
      paragraphs: [
        `A Filmsheet account for the firm ${input.firmName} was made with this address. If that was you, follow the link while signed in to it: the address is then confirmed.`,
        "If it was not you, ignore this e-mail. Nobody can confirm the address without this link, and the first time you sign in with an e-mailed link the password someone else chose stops working.",
      ],
      action: { label: "Confirm my address", url: input.url },
      note: `The link works once and expires at ${input.expiresAt.toUTCString()}.`,
    }),
  };
}
