// `npm run --silent calc`: calculation contract v1 on the command line — JSON body on stdin,
// JSON answer on stdout, the same as POST /api/calc but without its size limits.
import { calculate } from "../src/calc/index";
import { ZCalcBody, calcBodyError } from "../src/schemas/calc";

function fail(payload: unknown): never {
  process.stdout.write(JSON.stringify(payload) + "\n");
  process.exit(2);
}

const chunks: Buffer[] = [];
for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
let raw: unknown;
try {
  raw = JSON.parse(Buffer.concat(chunks).toString("utf8"));
} catch {
  fail({ error: { code: "bad_request", message: "Body is not valid JSON" } });
}
const parsed = ZCalcBody.safeParse(raw);
if (!parsed.success) fail(calcBodyError(parsed.error));
process.stdout.write(JSON.stringify(calculate(parsed.data)) + "\n");
