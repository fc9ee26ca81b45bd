"use client";

import { useActionState } from "react";
import { FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { muteAction } from "../check/actions";

/** The person's e-mail switch for one project: mute or resume. */
export function MuteForm({ projectId, muted }: { projectId: string; muted: boolean }) {
  const [state, run] = useActionState(muteAction, null);
  return (
    <form action={run} className="flex flex-wrap items-center gap-2" aria-label="E-mail about this project">
      <input type="hidden" name="projectId" value={projectId} />
      <input type="hidden" name="muted" value={muted ? "false" : "true"} />
      <span className="text-small text-muted">{muted ? "You receive no e-mail about this project." : "Check requests, queries, answers and issued revisions reach you by e-mail."}</span>
      <SubmitButton tone="quiet" className="py-1">{muted ? "Resume e-mail" : "Mute e-mail"}</SubmitButton>
      {state ? <FormMessage state={state} /> : null}
    </form>
  );
}
