// The schemas a typed, pasted or filled row is checked with before it is sent (the server checks
// it again with the same ones). With zod they are a chunk of their own, loaded once the sheet is
// on screen (cell-edits.ts: loadRowSchemas), not while the page starts.
import { ZDuctRunValues, ZSurfaceValues } from "@/schemas/schedule";

export const ROW_SCHEMAS = { surfaces: ZSurfaceValues, duct_runs: ZDuctRunValues } as const;
