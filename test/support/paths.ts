import { fileURLToPath } from "node:url";

/** The repository root, for tests that run the CLI or boot the built app. */
export const ROOT = fileURLToPath(new URL("../..", import.meta.url));
