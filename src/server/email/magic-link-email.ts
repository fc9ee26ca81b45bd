import "server-only";
import { renderEmail, type TEmailMessage } from "./message";

export function magicLinkEmail(input: { to: string; url: string; expiresAt: Date }): TEmailMessage {
  return {
    kind: "magic_link",
    to: input.to,
    subject: "Your Filmsheet sign-in link",
    ...renderEmail({
      heading: "Sign in to Filmsheet",
      paragraphs: ["Someone (we hope you) asked for a sign-in link for this address. Follow it to sign in without a password."],
      action: { label: "Sign in", url: input.url },
      note: `The link works once and expires at ${input.expiresAt.toUTCString()}. If you did not ask for it, ignore this e-mail: nobody can sign in without it.`,
    }),
  };
}
