import "server-only";
import { ROLE_LABELS, type TRole } from "@/schemas/roles";
import { renderEmail, type TEmailMessage } from "./message";

export function invitationEmail(input: { to: string; firmName: string; inviterName: string | null; roles: TRole[]; url: string; expiresAt: Date }): TEmailMessage {
  const who = input.inviterName ?? "An admin";
  const labels = input.roles.map((r) => ROLE_LABELS[r].toLowerCase());
  const roles = labels.length > 1 ? `${labels.slice(0, -1).join(", ")} and ${labels.at(-1)}` : labels[0]!;
  return {
    kind: "invitation",
    to: input.to,
    subject: `${who} invited you to ${input.firmName} on Filmsheet`,
    ...renderEmail({
      heading: `Join ${input.firmName} on Filmsheet`,
      paragraphs: [
        `${who} has invited you to join ${input.firmName} on Filmsheet as ${roles}.`,
        "Filmsheet keeps the firm's schedules of external surfaces and duct runs, their film coefficients, heat losses and gains, and the checks on every row.",
      ],
      action: { label: "Accept the invitation", url: input.url },
      note: `This link works once and expires on ${input.expiresAt.toUTCString()}. If you did not expect it, ignore this e-mail.`,
    }),
  };
}
