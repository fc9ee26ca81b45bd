import "server-only";
import { notFound } from "next/navigation";
import { ZProjectParams } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { AppError } from "@/server/http/app-error";

/** The signed-in member for a project page (any role), or 404 for a malformed id. */
export async function projectPageActor(projectId: string, path: string): Promise<Actor> {
  const actor = await requirePageActor(path);
  if (!ZProjectParams.safeParse({ projectId }).success) notFound();
  return actor;
}

/** Runs the loads of a page; another firm's (or a missing) project or revision becomes the 404 page. */
export async function orNotFound<T>(load: Promise<T>): Promise<T> {
  return load.catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
}
