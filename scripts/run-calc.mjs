// `npm run calc`: builds the command-line calculator if its sources changed (scripts/lib/
// calc-bundle.mjs), then runs it in this same process — one Node start-up, no TypeScript loader.
import { pathToFileURL } from "node:url";
import { ensureBundle } from "./lib/calc-bundle.mjs";

await import(pathToFileURL(await ensureBundle()).href);
