import "server-only";
import { renderEmail, type TEmailMessage } from "./message";
import { projectEmailNote, projectTitle } from "./project-note";

export function revisionIssuedEmail(input: { to: string; firmName: string; project: { reference: string; name: string }; letter: string; issuer: string; note: string; rows: number; url: string }): TEmailMessage {
  return {
    kind: "revision_issued",
    to: input.to,
    subject: `Revision ${input.letter} issued: ${projectTitle(input.project)}`,
    ...renderEmail({
      heading: `Revision ${input.letter} of ${input.project.reference} is issued`,
      paragraphs: [
        `${input.issuer} issued revision ${input.letter} of ${input.project.name}, with all ${input.rows} rows checked and accepted.`,
        ...(input.note ? [`“${input.note}”`] : []),
        "The revision is frozen: later edits go into the next draft. Its results are engineering estimates; the design must be verified by a competent, licensed engineer under local codes and standards.",
      ],
      action: { label: `Open revision ${input.letter}`, url: input.url },
      note: projectEmailNote(input.firmName),
    }),
  };
}
