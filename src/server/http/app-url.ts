import "server-only";
import { env } from "@/server/env";

/** An absolute address on the configured APP_URL (never on the request's Host header). */
export function appUrl(path: string): string {
  return new URL(path, env().APP_URL).toString();
}
