// POST /api/calc: calculation contract (shared/design/calc-contract.md); the same bytes as `npm run calc`.
// Any member or API token may calculate; anonymous callers get 401.
import { CALC_LIMITS, ZCalcBody } from "@/schemas/calc";
import { route } from "@/server/http/route";
import { runCalc } from "@/server/services/run-calc";

export const POST = route(
  { body: ZCalcBody, invalidStatus: 400, maxBodyBytes: CALC_LIMITS.maxBytes },
  ({ body }) => runCalc(body),
);
