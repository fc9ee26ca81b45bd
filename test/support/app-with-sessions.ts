import { startBuiltApp } from "./built-app";
import { sessionCookie } from "./sessions";

export type BuiltApp = Awaited<ReturnType<typeof startBuiltApp>>;

/**
 * The built app in this process and, for each demo account named, the headers of a signed-in
 * browser (session cookie and same-site Origin).
 */
export async function startAppWithSessions<E extends string>(emails: readonly E[]): Promise<{ app: BuiltApp; as: Record<E, Record<string, string>> }> {
  const app = await startBuiltApp();
  const { port } = app.server.address() as { port: number };
  const origin = `http://127.0.0.1:${port}`;
  const password = process.env.DEMO_PASSWORD || "filmsheet-demo";
  const as = {} as Record<E, Record<string, string>>;
  for (const email of emails) as[email] = { cookie: await sessionCookie(app.server, email, password), origin };
  return { app, as };
}
