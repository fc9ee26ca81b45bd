"use client";

import { useActionState } from "react";
import { FormMessage, SubmitButton, TextAreaField } from "@/components/forms/form-parts";
import { issueRevisionAction, requestCheckAction } from "../check/actions";

/** A consultant asks the firm's checkers to check the project. */
export function RequestCheckForm({ projectId }: { projectId: string }) {
  const [state, run] = useActionState(requestCheckAction, null);
  return (
    <form action={run} className="grid gap-3" aria-label="Ask for a check">
      <input type="hidden" name="projectId" value={projectId} />
      <TextAreaField label="Message to the checkers" name="message" hint="Optional: what changed, what to look at first" state={state} maxLength={2000} />
      <div>
        <SubmitButton>Ask for a check</SubmitButton>
      </div>
      <FormMessage state={state} />
    </form>
  );
}

/**
 * A checker issues the next revision once every row is accepted. Stays mounted while rows are
 * still open (showing why it cannot issue yet), so the outcome of the last issue stays on screen.
 */
export function IssueRevisionForm({ projectId, letter, open }: { projectId: string; letter: string; open: number }) {
  const [state, run] = useActionState(issueRevisionAction, null);
  return (
    <div className="grid gap-3">
      {open === 0 ? (
        <form action={run} className="grid gap-3" aria-label={`Issue revision ${letter}`}>
          <input type="hidden" name="projectId" value={projectId} />
          <TextAreaField label="Note for the revision" name="note" hint="Optional: the purpose of this issue, e.g. “For tender”" state={state} maxLength={2000} rows={2} />
          <div>
            <SubmitButton>Issue revision {letter}</SubmitButton>
          </div>
        </form>
      ) : (
        <p className="text-small text-muted">The issue button appears here once the last row is accepted.</p>
      )}
      <FormMessage state={state} />
    </div>
  );
}
