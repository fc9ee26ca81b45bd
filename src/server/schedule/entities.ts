import "server-only";
import type { ZodType } from "zod";
import {
  BUILDUP_NUMBERS,
  DESIGN_CASE_NUMBERS,
  DUCT_RUN_NUMBERS,
  SURFACE_NUMBERS,
  ZONE_NUMBERS,
  type NumberSpec,
} from "@/schemas/schedule-fields";
import { CREATE_DEFAULTS, ZBuildupValues, ZDesignCaseValues, ZDuctRunValues, ZSurfaceValues, ZZoneValues } from "@/schemas/schedule";

export const ENTITY_NAMES = ["design_cases", "zones", "buildups", "surfaces", "duct_runs"] as const;
export type EntityName = (typeof ENTITY_NAMES)[number];

export interface Reference {
  field: string;
  table: "zones" | "buildups";
  noun: string;
}

export interface Entity {
  table: EntityName;
  /** "surface", "duct run" … for messages. */
  noun: string;
  schema: ZodType<Record<string, unknown>>;
  /** Field names the schema accepts, in order: also the table's value columns. */
  fields: readonly string[];
  numbers: Record<string, NumberSpec>;
  /** Nullable fields besides the numbers, blank (null) when a create leaves them out. */
  blanks: readonly string[];
  /** Values a create that leaves these fields out gets (fields never blank, added after v1). */
  defaults: Readonly<Record<string, unknown>>;
  /** Rows of the schedule keep an order (position); the other tables sort by name. */
  positioned: boolean;
  references: readonly Reference[];
  /** Tables whose rows point here, for a clear refusal when deleting something still in use. */
  usedBy: readonly { table: EntityName; field: string; noun: string }[];
}

const shapeKeys = (schema: { shape: Record<string, unknown> }) => Object.keys(schema.shape);
const ZONE_REF: Reference = { field: "zone_id", table: "zones", noun: "Zone" };

export const ENTITIES: Record<EntityName, Entity> = {
  design_cases: {
    table: "design_cases",
    noun: "design case",
    schema: ZDesignCaseValues as ZodType<Record<string, unknown>>,
    fields: shapeKeys(ZDesignCaseValues),
    numbers: DESIGN_CASE_NUMBERS,
    blanks: [],
    defaults: CREATE_DEFAULTS.design_cases,
    positioned: false,
    references: [],
    usedBy: [],
  },
  zones: {
    table: "zones",
    noun: "zone",
    schema: ZZoneValues as ZodType<Record<string, unknown>>,
    fields: shapeKeys(ZZoneValues),
    numbers: ZONE_NUMBERS,
    blanks: [],
    defaults: CREATE_DEFAULTS.zones,
    positioned: false,
    references: [],
    usedBy: [
      { table: "surfaces", field: "zone_id", noun: "surfaces" },
      { table: "duct_runs", field: "zone_id", noun: "duct runs" },
    ],
  },
  buildups: {
    table: "buildups",
    noun: "build-up",
    schema: ZBuildupValues as unknown as ZodType<Record<string, unknown>>,
    fields: shapeKeys(ZBuildupValues),
    numbers: BUILDUP_NUMBERS,
    blanks: [],
    defaults: CREATE_DEFAULTS.buildups,
    positioned: false,
    references: [],
    usedBy: [{ table: "surfaces", field: "buildup_id", noun: "surfaces" }],
  },
  surfaces: {
    table: "surfaces",
    noun: "surface",
    schema: ZSurfaceValues as ZodType<Record<string, unknown>>,
    fields: shapeKeys(ZSurfaceValues),
    numbers: SURFACE_NUMBERS,
    blanks: ["method"],
    defaults: CREATE_DEFAULTS.surfaces,
    positioned: true,
    references: [ZONE_REF, { field: "buildup_id", table: "buildups", noun: "Build-up" }],
    usedBy: [],
  },
  duct_runs: {
    table: "duct_runs",
    noun: "duct run",
    schema: ZDuctRunValues as unknown as ZodType<Record<string, unknown>>,
    fields: shapeKeys(ZDuctRunValues),
    numbers: DUCT_RUN_NUMBERS,
    blanks: [],
    defaults: CREATE_DEFAULTS.duct_runs,
    positioned: true,
    references: [ZONE_REF],
    usedBy: [],
  },
};

/** Columns read back for a row: its id, version, order and values (no firm or project ids). */
export function readColumns(e: Entity): string[] {
  return ["id", "version", ...(e.positioned ? ["position"] : []), ...e.fields.filter((f) => f !== "layers")];
}
