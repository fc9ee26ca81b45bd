import { z } from "zod";

export const ZProjectParams = z.object({ projectId: z.uuid({ error: "Project id must be a UUID" }) });

export const ZProjectCreate = z.object({
  name: z.string({ error: "Name is required" }).trim().min(1, "Name is required").max(200, "Name is at most 200 characters"),
  reference: z
    .string({ error: "Reference is required" })
    .trim()
    .min(1, "Reference is required")
    .max(40, "Reference is at most 40 characters")
    .regex(/^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/, "Reference may hold letters, digits, spaces and . _ / -"),
});
export type TProjectCreate = z.infer<typeof ZProjectCreate>;

export interface TProject {
  id: string;
  name: string;
  reference: string;
  created_at: string;
  updated_at: string;
  version: number;
}
