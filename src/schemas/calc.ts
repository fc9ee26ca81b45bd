import { z } from "zod";

/** Limits of POST /api/calc (the command line takes any size). */
export const CALC_LIMITS = {
  maxCases: 10_000,
  /** 5 MiB. */
  maxBytes: 5 * 1024 * 1024,
} as const;

/**
 * The shape of a calculation request (contract v1): an object with an array `cases`. Each case is
 * checked by the engine itself, which answers per case, so one bad case never spoils the others.
 */
export const ZCalcBody = z.object({
  cases: z.array(z.unknown(), { error: '"cases" must be an array of case objects' }),
});
export type TCalcBody = z.infer<typeof ZCalcBody>;

/** The error body for a request that is not of the contract's shape, as the API answers it. */
export function calcBodyError(error: z.ZodError): { error: { code: "bad_request"; message: string; details: { field: string; message: string }[] } } {
  return {
    error: {
      code: "bad_request",
      message: "Invalid body",
      details: error.issues.map((i) => ({ field: ["body", ...i.path].join("."), message: i.message })),
    },
  };
}
