import "server-only";
import { renderEmail, type TEmailMessage } from "./message";
import { projectEmailNote, projectTitle } from "./project-note";

export function rowQueriedEmail(input: { to: string; firmName: string; project: { reference: string; name: string }; checker: string; rowLabel: string; query: string; url: string }): TEmailMessage {
  return {
    kind: "row_queried",
    to: input.to,
    subject: `Query on ${input.rowLabel} — ${projectTitle(input.project)}`,
    ...renderEmail({
      heading: `${input.checker} queried “${input.rowLabel}”`,
      paragraphs: [`“${input.query}”`, "Answer in the row's thread, and change the row if it needs it: a changed row goes back to unchecked for another look."],
      action: { label: "Open the row", url: input.url },
      note: projectEmailNote(input.firmName),
    }),
  };
}
