"use client";

import { useActionState } from "react";
import { Field, FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { Panel } from "@/components/panel";
import { createProjectAction } from "./actions";

export function NewProjectForm() {
  const [state, submit] = useActionState(createProjectAction, null);
  return (
    <Panel title="New project" lead="Creating it opens the project, where its zones, build-ups and design cases come first, then the schedule.">
      <form action={submit} className="grid gap-3 sm:grid-cols-[10rem_1fr_auto] sm:items-start" noValidate>
        <Field label="Reference" name="reference" placeholder="TS-2501" required state={state} />
        <Field label="Name" name="name" placeholder="Building and scope" required state={state} />
        <div className="sm:pt-6">
          <SubmitButton>Create project</SubmitButton>
        </div>
        <div className="sm:col-span-3">
          <FormMessage state={state} />
        </div>
      </form>
    </Panel>
  );
}
