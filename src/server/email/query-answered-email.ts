import "server-only";
import { renderEmail, type TEmailMessage } from "./message";
import { projectEmailNote, projectTitle } from "./project-note";

export function queryAnsweredEmail(input: { to: string; firmName: string; project: { reference: string; name: string }; author: string; rowLabel: string; answer: string; url: string }): TEmailMessage {
  return {
    kind: "query_answered",
    to: input.to,
    subject: `Answer on ${input.rowLabel} — ${projectTitle(input.project)}`,
    ...renderEmail({
      heading: `${input.author} answered your query on “${input.rowLabel}”`,
      paragraphs: [`“${input.answer}”`, "Read the answer and the row's working again, then accept the row or keep the query open."],
      action: { label: "Open the row", url: input.url },
      note: projectEmailNote(input.firmName),
    }),
  };
}
