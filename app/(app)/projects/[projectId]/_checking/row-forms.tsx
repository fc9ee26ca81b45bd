"use client";

import { useActionState } from "react";
import type { TCheckSheet } from "@/checking/check-machine";
import { FormMessage, SubmitButton, TextAreaField } from "@/components/forms/form-parts";
import { checkRowAction, commentAction } from "../check/actions";

type RowKey = { projectId: string; sheet: TCheckSheet; rowId: string };

function RowFields({ projectId, sheet, rowId }: RowKey) {
  return (
    <>
      <input type="hidden" name="projectId" value={projectId} />
      <input type="hidden" name="sheet" value={sheet} />
      <input type="hidden" name="rowId" value={rowId} />
    </>
  );
}

/** Accept or query the row at the version on screen; a query needs the comment. */
export function CheckRowForm({ row, version, canAccept, canQuery }: { row: RowKey; version: number; canAccept: boolean; canQuery: boolean }) {
  const [state, run] = useActionState(checkRowAction, null);
  return (
    <form action={run} className="grid gap-3" aria-label="Check this row">
      <RowFields {...row} />
      <input type="hidden" name="row_version" value={version} />
      <TextAreaField label="Comment" name="comment" hint="Needed for a query: say what to look at. Optional when accepting." state={state} maxLength={4000} />
      <div className="flex flex-wrap gap-2">
        {canAccept ? (
          <SubmitButton name="move" value="accept">
            Accept
          </SubmitButton>
        ) : null}
        {canQuery ? (
          <SubmitButton name="move" value="query" tone="danger">
            Query
          </SubmitButton>
        ) : null}
      </div>
      <FormMessage state={state} />
    </form>
  );
}

/** Adds to the row's thread; a consultant's comment on a queried row answers the query. */
export function CommentForm({ row, answering }: { row: RowKey; answering: boolean }) {
  const [state, run] = useActionState(commentAction, null);
  return (
    <form action={run} className="grid gap-2" aria-label={answering ? "Answer the query" : "Add a comment"}>
      <RowFields {...row} />
      <TextAreaField label={answering ? "Your answer" : "Comment"} name="body" state={state} maxLength={4000} required />
      <div>
        <SubmitButton tone="quiet">{answering ? "Send answer" : "Add comment"}</SubmitButton>
      </div>
      <FormMessage state={state} />
    </form>
  );
}
