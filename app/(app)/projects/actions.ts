"use server";
// Server actions of the projects page.
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { ZProjectCreate } from "@/schemas/project";
import { action } from "@/server/http/action";
import { createProject } from "@/server/services/create-project";

export const createProjectAction = action({ roles: ["consultant"], input: ZProjectCreate }, async ({ actor, input }) => {
  const project = await createProject(actor, input);
  revalidatePath("/projects");
  // Straight into the new project, whose page says what to set up first.
  redirect(`/projects/${project.id}`);
});
