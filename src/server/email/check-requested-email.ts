import "server-only";
import { renderEmail, type TEmailMessage } from "./message";
import { projectEmailNote, projectTitle } from "./project-note";

export function checkRequestedEmail(input: {
  to: string;
  firmName: string;
  project: { reference: string; name: string };
  requester: string;
  message: string;
  counts: { rows: number; unchecked: number; queried: number };
  url: string;
}): TEmailMessage {
  const c = input.counts;
  return {
    kind: "check_requested",
    to: input.to,
    subject: `Check requested: ${projectTitle(input.project)}`,
    ...renderEmail({
      heading: `${input.requester} asks for a check of ${input.project.reference}`,
      paragraphs: [
        ...(input.message ? [`“${input.message}”`] : []),
        `${input.project.name}: ${c.rows} rows, of which ${c.unchecked} unchecked and ${c.queried} queried.`,
        "Read each row's working, then accept it or query it. When every row is accepted, a checker can issue the next revision.",
      ],
      action: { label: "Open the check view", url: input.url },
      note: projectEmailNote(input.firmName),
    }),
  };
}
