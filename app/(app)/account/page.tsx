import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getViewer } from "@/server/auth/get-viewer";
import { db } from "@/server/db/knex";
import { AccountView } from "./account-view";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const viewer = await getViewer();
  if (!viewer) redirect(`/sign-in?${new URLSearchParams({ callbackUrl: "/account" })}`);
  const [row] = await db()("user_sessions").where({ user_id: viewer.user.id }).whereNull("revoked_at").andWhere("expires_at", ">", db().fn.now()).count({ n: "*" });
  const user = await db()("users").where({ id: viewer.user.id }).first<{ confirmed: boolean }>(db().raw('"emailVerified" IS NOT NULL AS confirmed'));
  return <AccountView user={viewer.user} sessions={Number(row?.n ?? 1)} confirmed={user?.confirmed ?? false} />;
}
