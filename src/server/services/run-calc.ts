import "server-only";
import { calcAnswerText } from "@/calc/serialize";
import { CALC_LIMITS, type TCalcBody } from "@/schemas/calc";
import { AppError } from "@/server/http/app-error";

/**
 * Runs a calculation request within the HTTP endpoint's size limits. The body text comes from the
 * writer `npm run calc` uses too (src/calc/serialize.ts), so both answer byte for byte the same.
 */
export function runCalc(body: TCalcBody): Response {
  if (body.cases.length > CALC_LIMITS.maxCases) {
    throw new AppError(
      "payload_too_large",
      `A request holds at most ${CALC_LIMITS.maxCases} cases (got ${body.cases.length}); split it or use npm run calc`,
    );
  }
  return new Response(calcAnswerText(body.cases), { headers: { "content-type": "application/json" } });
}
