/**
 * zod schemas of a project's schedule, shared by the routes, the importer, the grid and the forms.
 * They map one to one onto the engine's schedule types (src/calc/schedule/types.ts), in SI.
 * Base schemas carry no defaults: a create fills blanks first (`withBlanks`), an update merges
 * its changes into the stored row, and the whole row is checked, so cross-field rules always run.
 */
import { z } from "zod";
import { ORIENTATIONS } from "@/calc/index";
import {
  BUILDUP_NUMBERS,
  CASE_KIND_OPTIONS,
  DESIGN_CASE_NUMBERS,
  DUCT_RUN_NUMBERS,
  EXPOSED_TO_LABEL,
  EXPOSURE_OPTIONS,
  IN_SERVED_ZONE_LABEL,
  LAYER_NUMBERS,
  LOCATION_OPTIONS,
  METHOD_OPTIONS,
  SHAPE_OPTIONS,
  SHEETS,
  SOLAR_SPEC,
  SURFACE_NUMBERS,
  ZONE_NUMBERS,
  numberProblem,
  values,
  type NumberSpec,
  type Option,
} from "./schedule-fields";

/** A number checked against its field's rule; nullable when the field has a blank meaning. */
export function zNumber(spec: NumberSpec) {
  const base = z
    .number({ error: (i) => (i.input === undefined ? `${spec.label} is required` : `${spec.label} must be a number`) })
    .superRefine((v, ctx) => {
      const problem = numberProblem(spec, v);
      if (problem) ctx.addIssue({ code: "custom", message: problem });
    });
  return spec.blank === undefined ? base : base.nullable();
}

export function zOneOf<T extends readonly Option[]>(label: string, options: T) {
  const list = options.map((o) => o.value).join(", ");
  return z.enum(values(options), { error: `${label} must be one of: ${list}` });
}

export const zName = (label: string, max = 120) =>
  z.string({ error: `${label} is required` }).trim().min(1, `${label} is required`).max(max, `${label} is at most ${max} characters`);

const zRef = (label: string) => z.uuid({ error: `${label} is required (an id of this project)` });

type Specs = Record<string, NumberSpec>;
const numbers = <S extends Specs>(specs: S) =>
  Object.fromEntries(Object.entries(specs).map(([k, s]) => [k, zNumber(s)])) as { [K in keyof S]: S[K] extends { blank: string } ? z.ZodNullable<z.ZodNumber> : z.ZodNumber };

/** A yes/no input; a string or a number is refused rather than read as truthy. */
export const zFlag = (label: string) => z.boolean({ error: `${label} must be true or false` });

/**
 * Blanks for a create's left-out nullable fields: numbers with a blank meaning, and `extra` (e.g.
 * method); then `defaults` for left-out fields that are never blank (the v2 inputs: a client or a
 * file from before them still creates rows, as the database's column defaults would).
 */
export function withBlanks(specs: Specs, input: Record<string, unknown>, extra: readonly string[] = [], defaults: Record<string, unknown> = {}): Record<string, unknown> {
  const out: Record<string, unknown> = { ...input };
  for (const [k, s] of Object.entries(specs)) if (s.blank !== undefined && out[k] === undefined) out[k] = null;
  for (const k of extra) if (out[k] === undefined) out[k] = null;
  for (const [k, v] of Object.entries(defaults)) if (out[k] === undefined) out[k] = v;
  return out;
}

/** What a create that leaves out a v2 input gets: the same values as the migration's column defaults. */
export const CREATE_DEFAULTS = {
  design_cases: { cloud_cover: 0 },
  zones: {},
  buildups: {},
  surfaces: { exposed_to: "outside_air" },
  duct_runs: { in_served_zone: false },
} as const satisfies Record<string, Record<string, unknown>>;

// ---------------------------------------------------------------- design cases

const solarEntries = Object.fromEntries([...ORIENTATIONS, "horizontal"].map((o) => [o, zNumber({ ...SOLAR_SPEC, label: `Solar irradiance ${o}` }).optional()]));
export const ZSolarTable = z.strictObject(solarEntries as Record<(typeof ORIENTATIONS)[number] | "horizontal", z.ZodOptional<z.ZodNumber>>);

export const ZDesignCaseValues = z.strictObject({
  name: zName("Name", 80),
  kind: zOneOf("Kind", CASE_KIND_OPTIONS),
  ...numbers(DESIGN_CASE_NUMBERS),
  solar_W_m2: ZSolarTable,
});
export type TDesignCaseValues = z.infer<typeof ZDesignCaseValues>;

// ---------------------------------------------------------------- zones

export const ZZoneValues = z.strictObject({ name: zName("Name", 80), ...numbers(ZONE_NUMBERS) });
export type TZoneValues = z.infer<typeof ZZoneValues>;

// ---------------------------------------------------------------- build-ups

export const ZLayer = z.strictObject({ material: zName("Material", 80), ...numbers(LAYER_NUMBERS) });
export const ZBuildupValues = z
  .strictObject({
    name: zName("Name", 80),
    layers: z.array(ZLayer, { error: "Layers must be a list" }).max(20, "A build-up has at most 20 layers"),
    ...numbers(BUILDUP_NUMBERS),
  })
  .superRefine((b, ctx) => {
    // The engine takes the layers when there are any, else the direct R: one must be given, not both.
    if (b.layers.length === 0 && b.R_direct_m2K_W === null) ctx.addIssue({ code: "custom", path: ["R_direct_m2K_W"], message: "Give the layers or a direct R" });
    if (b.layers.length > 0 && b.R_direct_m2K_W !== null) ctx.addIssue({ code: "custom", path: ["R_direct_m2K_W"], message: "Direct R must be blank when the build-up has layers" });
  });
export type TBuildupValues = z.infer<typeof ZBuildupValues>;
export type TLayer = z.infer<typeof ZLayer>;

// ---------------------------------------------------------------- surfaces

export const ZSurfaceValues = z.strictObject({
  label: zName("Label"),
  zone_id: zRef("Zone"),
  buildup_id: zRef("Build-up"),
  ...numbers(SURFACE_NUMBERS),
  method: zOneOf("Method", METHOD_OPTIONS).nullable(),
  exposed_to: zOneOf(EXPOSED_TO_LABEL, EXPOSURE_OPTIONS),
});
export type TSurfaceValues = z.infer<typeof ZSurfaceValues>;

// ---------------------------------------------------------------- duct runs

export const ZDuctRunValues = z
  .strictObject({
    label: zName("Label"),
    zone_id: zRef("Zone"),
    shape: zOneOf("Shape", SHAPE_OPTIONS),
    location: zOneOf("Location", LOCATION_OPTIONS),
    ...numbers(DUCT_RUN_NUMBERS),
    in_served_zone: zFlag(IN_SERVED_ZONE_LABEL),
  })
  .superRefine((d, ctx) => {
    const need = (field: "diameter_m" | "width_m" | "height_m", what: string) => {
      if (d[field] === null) ctx.addIssue({ code: "custom", path: [field], message: `${DUCT_RUN_NUMBERS[field].label} is required for a ${what} duct` });
    };
    if (d.shape === "round") need("diameter_m", "round");
    else {
      need("width_m", "rectangular");
      need("height_m", "rectangular");
    }
  });
export type TDuctRunValues = z.infer<typeof ZDuctRunValues>;

// ---------------------------------------------------------------- stored rows and the schedule

export interface Stored {
  id: string;
  version: number;
}
export type TDesignCase = TDesignCaseValues & Stored;
export type TZone = TZoneValues & Stored;
export type TBuildup = TBuildupValues & Stored;
export type TSurface = TSurfaceValues & Stored & { position: number };
export type TDuctRun = TDuctRunValues & Stored & { position: number };

export { SHEETS, type TSheet } from "./schedule-fields";
export const ZSheet = z.enum(SHEETS, { error: "Sheet must be surfaces or duct_runs" });

export const ZVersion = z.int({ error: "version is required (the version you last read)" }).positive("version must be a positive integer");
export const ZItemParams = z.object({ projectId: z.uuid({ error: "Project id must be a UUID" }), itemId: z.uuid({ error: "Id must be a UUID" }) });
export const ZDeleteQuery = z.object({ version: z.coerce.number({ error: "version is required" }).pipe(ZVersion) });

/** A whole project as the grid and the results read it. */
export interface TSchedule {
  project: import("./project").TProject;
  design_cases: TDesignCase[];
  zones: TZone[];
  buildups: TBuildup[];
  surfaces: TSurface[];
  duct_runs: TDuctRun[];
}
