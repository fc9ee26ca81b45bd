// `npm run docs:methods`: writes docs/methods.md from the engine's registry.
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { methodStatementMarkdown } from "../src/calc/method-statement";

const out = fileURLToPath(new URL("../docs/methods.md", import.meta.url));
writeFileSync(out, methodStatementMarkdown());
console.log(`wrote ${out}`);
