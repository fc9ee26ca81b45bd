import { z } from "zod";
import type { Site } from "@/calc/index";
import type { UnitSystem } from "@/units/units";
import { METHOD_OPTIONS, PROJECT_NUMBERS, TERRAIN_OPTIONS, UNIT_OPTIONS, WIND_LAW_OPTIONS } from "./schedule-fields";
import { ZVersion, zNumber, zOneOf } from "./schedule";

export const ZProjectParams = z.object({ projectId: z.uuid({ error: "Project id must be a UUID" }) });

const name = z.string({ error: "Name is required" }).trim().min(1, "Name is required").max(200, "Name is at most 200 characters");
const reference = z
  .string({ error: "Reference is required" })
  .trim()
  .min(1, "Reference is required")
  .max(40, "Reference is at most 40 characters")
  .regex(/^[A-Za-z0-9][A-Za-z0-9 ._/-]*$/, "Reference may hold letters, digits, spaces and . _ / -");

/** The site and the way a project is read: altitude, terrain, wind law, units, default method. */
const site = {
  altitude_m: zNumber(PROJECT_NUMBERS.altitude_m),
  terrain: zOneOf("Terrain", TERRAIN_OPTIONS),
  wind_law: zOneOf("Wind law", WIND_LAW_OPTIONS),
  unit_system: zOneOf("Unit system", UNIT_OPTIONS),
  default_method: zOneOf("Default method", METHOD_OPTIONS),
};

// The site fields are optional on create: the database gives a new project sea level, suburban
// terrain, the power law, SI and the boundary-layer method until someone says otherwise.
export const ZProjectCreate = z.object({ name, reference, ...site }).partial({ altitude_m: true, terrain: true, wind_law: true, unit_system: true, default_method: true });
export type TProjectCreate = z.infer<typeof ZProjectCreate>;

export const ZProjectUpdate = z.strictObject({ version: ZVersion, name, reference, ...site }).partial({ name: true, reference: true, altitude_m: true, terrain: true, wind_law: true, unit_system: true, default_method: true });
export type TProjectUpdate = z.infer<typeof ZProjectUpdate>;

export interface TProject {
  id: string;
  name: string;
  reference: string;
  altitude_m: number;
  terrain: Site["terrain"];
  wind_law: Site["wind_law"];
  unit_system: UnitSystem;
  default_method: Site["method"];
  created_at: string;
  updated_at: string;
  version: number;
  /** Set while the project is archived (read-only, listed apart); null while in use. */
  archived_at: string | null;
}

/** Archive or bring back a project at the version read (admins). */
export const ZProjectArchive = z.strictObject({ version: ZVersion });
export type TProjectArchive = z.infer<typeof ZProjectArchive>;

/** `GET /api/projects?archived=1` lists the archived projects instead of those in use. */
export const ZProjectListQuery = z.object({ archived: z.enum(["0", "1"], { error: "archived must be 0 or 1" }).optional() });
