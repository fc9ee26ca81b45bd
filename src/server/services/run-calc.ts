import "server-only";
import { calculate, type CalcResult } from "@/calc/index";
import { CALC_LIMITS, type TCalcBody } from "@/schemas/calc";
import { AppError } from "@/server/http/app-error";

/** Runs a calculation request within the HTTP endpoint's size limits. */
export function runCalc(body: TCalcBody): { results: CalcResult[] } {
  if (body.cases.length > CALC_LIMITS.maxCases) {
    throw new AppError(
      "payload_too_large",
      `A request holds at most ${CALC_LIMITS.maxCases} cases (got ${body.cases.length}); split it or use npm run calc`,
    );
  }
  return calculate(body);
}
